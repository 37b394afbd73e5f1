import { eq } from "drizzle-orm";
import { projects, type Project } from "@/db/schema";
import type { EditProjectInput } from "@/lib/validation/project";
import { writeAudit } from "./audit";
import { getProjectForStaff } from "./projects";
import { writeTransaction } from "./serial-write";
import type { Actor } from "./users";

type Field = "name" | "siteAddress" | "installDate";
const FIELDS: readonly Field[] = ["name", "siteAddress", "installDate"];

/**
 * Corrects a project's name, site address or install date. Order-by dates are never stored on the
 * live screens (decisions and the current specification count back from the install date each
 * time they are read), so they follow at once; an issued revision keeps the dates it was issued
 * with, and the next revision carries the new ones. The audit row records each field from → to.
 */
export async function updateProject(actor: Actor, projectId: string, input: EditProjectInput): Promise<Project> {
  const before = await getProjectForStaff(actor, projectId);
  return writeTransaction(async (tx) => {
    const current = (await tx.query.projects.findFirst({ where: eq(projects.id, before.id) })) ?? before;
    const changes: Partial<Record<Field, { from: string | null; to: string | null }>> = {};
    for (const field of FIELDS) {
      const to = input[field];
      if (to !== undefined && to !== current[field]) changes[field] = { from: current[field], to };
    }
    if (Object.keys(changes).length === 0) return current;
    const set = Object.fromEntries(Object.entries(changes).map(([field, change]) => [field, change.to]));
    const [updated] = await tx.update(projects).set(set).where(eq(projects.id, current.id)).returning();
    if (!updated) throw new Error("project update returned nothing");
    await writeAudit(
      { studioId: current.studioId, projectId: current.id, actorId: actor.userId, action: "project.updated", entityType: "project", entityId: current.id, detail: { title: updated.name, changes } },
      tx,
    );
    return updated;
  });
}
