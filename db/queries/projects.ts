import { and, asc, eq, inArray, isNull, or, sql } from "drizzle-orm";
import { db } from "@/db";
import { writeTransaction } from "./serial-write";
import { projectInvitations, projectMembers, projects, rooms, suppliers, users } from "@/db/schema";
import { projectRole } from "@/lib/auth/permissions";
import { forbidden, notFound } from "@/lib/http";
import type { CreateProjectInput } from "@/lib/validation/project";
import { writeAudit } from "./audit";
import type { Actor } from "./users";

/** Projects this person may see: all of their studio's, plus those they belong to. */
export async function listProjectsForActor(actor: Actor) {
  const memberOf = actor.projects.map((p) => p.projectId);
  const visible = or(
    actor.studio ? eq(projects.studioId, actor.studio.id) : sql`0`,
    memberOf.length ? inArray(projects.id, memberOf) : sql`0`,
  );
  const rows = await db
    .select({
      id: projects.id,
      studioId: projects.studioId,
      name: projects.name,
      siteAddress: projects.siteAddress,
      installDate: projects.installDate,
      // Raw column names: inside a correlated subquery drizzle would leave them unqualified.
      openDecisions: sql<number>`(select count(*) from "decision" d where d."project_id" = "project"."id" and d."status" != 'locked')`,
      nextDue: sql<string | null>`(select min(d."due_date") from "decision" d where d."project_id" = "project"."id" and d."status" != 'locked')`,
    })
    .from(projects)
    .where(and(visible, isNull(projects.archivedAt)))
    .orderBy(asc(projects.installDate), asc(projects.name));
  return rows.map((row) => ({ ...row, role: projectRole(actor, row.id, row.studioId) }));
}

/** The one way to open a project: 404 when it doesn't exist or this person may not see it. */
export async function getProjectForActor(actor: Actor, projectId: string) {
  const project = await db.query.projects.findFirst({ where: eq(projects.id, projectId) });
  if (!project) throw notFound("That project");
  const role = projectRole(actor, project.id, project.studioId);
  if (!role) throw notFound("That project");
  return { project, role };
}

/** Studio staff only: a project to change, not just to read. */
export async function getProjectForStaff(actor: Actor, projectId: string) {
  const { project, role } = await getProjectForActor(actor, projectId);
  if (role !== "staff") throw forbidden();
  return project;
}

export async function listRooms(projectId: string) {
  return db.select().from(rooms).where(eq(rooms.projectId, projectId)).orderBy(asc(rooms.sortOrder), asc(rooms.name));
}

/**
 * The project's clients and suppliers' contacts as its studio sees them: by the name the studio
 * typed (never the person's own account name, which another studio may have set). Someone who
 * hasn't joined yet (a new person who hasn't signed in, or an account holder who hasn't accepted)
 * is listed the same way either way, so the list doesn't tell whether an address had an account.
 */
export async function listProjectPeople(projectId: string): Promise<ProjectPerson[]> {
  const [members, invitations] = await Promise.all([
    db
      .select({
        id: projectMembers.id,
        userId: projectMembers.userId,
        supplierId: projectMembers.supplierId,
        name: projectMembers.displayName,
        email: users.email,
        role: projectMembers.role,
        supplierName: suppliers.name,
        joined: sql<number>`("user"."emailVerified" is not null or "user"."password_hash" is not null)`,
      })
      .from(projectMembers)
      .innerJoin(users, eq(users.id, projectMembers.userId))
      .leftJoin(suppliers, eq(suppliers.id, projectMembers.supplierId))
      .where(eq(projectMembers.projectId, projectId)),
    db
      .select({
        id: projectInvitations.id,
        name: projectInvitations.name,
        email: projectInvitations.email,
        role: projectInvitations.role,
        supplierName: suppliers.name,
      })
      .from(projectInvitations)
      .leftJoin(suppliers, eq(suppliers.id, projectInvitations.supplierId))
      .where(eq(projectInvitations.projectId, projectId)),
  ]);
  const people: ProjectPerson[] = [
    ...members.map((m) => ({ ...m, name: m.name ?? m.email, joined: Boolean(m.joined) })),
    ...invitations.map((i) => ({ ...i, userId: null, supplierId: null, name: i.name ?? i.email, joined: false })),
  ];
  return people.sort((a, b) => a.role.localeCompare(b.role) || a.name.localeCompare(b.name));
}

export type ProjectPerson = {
  id: string;
  /** Set for members (who can be moved or removed); null for an invitation not yet accepted. */
  userId: string | null;
  supplierId: string | null;
  name: string;
  email: string;
  role: "client" | "supplier";
  supplierName: string | null;
  /** False until they have signed in (or, with an account already, accepted). */
  joined: boolean;
};

/** A new project with its rooms, in one transaction. */
export async function createProject(actor: Actor, input: CreateProjectInput) {
  const studioId = actor.studio?.id;
  if (!studioId) throw forbidden();
  return writeTransaction(async (tx) => {
    const [project] = await tx
      .insert(projects)
      .values({ studioId, name: input.name, siteAddress: input.siteAddress || null, installDate: input.installDate || null })
      .returning();
    if (!project) throw new Error("project insert returned nothing");
    if (input.rooms.length) {
      await tx.insert(rooms).values(input.rooms.map((name, i) => ({ projectId: project.id, name, sortOrder: i })));
    }
    await writeAudit({ studioId, projectId: project.id, actorId: actor.userId, action: "project.created", entityType: "project", entityId: project.id }, tx);
    return project;
  });
}
