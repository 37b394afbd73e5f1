import { and, asc, desc, eq, inArray, ne, sql } from "drizzle-orm";
import { db } from "@/db";
import { boards, decisions, projects, rooms, specLines, specRevisions, supplierAcknowledgements } from "@/db/schema";
import { clientProjectIds } from "@/lib/auth/permissions";
import type { Actor } from "./users";

/** A client's projects and the decisions still waiting on them, soonest due first. */
export async function getClientHome(actor: Actor) {
  const ids = clientProjectIds(actor);
  if (ids.length === 0) return { projects: [], waiting: [], boards: [] };
  const [projectRows, waiting, boardRows] = await Promise.all([
    db.select().from(projects).where(inArray(projects.id, ids)).orderBy(asc(projects.name)),
    db
      .select({
        id: decisions.id,
        projectId: decisions.projectId,
        title: decisions.title,
        dueDate: decisions.dueDate,
        status: decisions.status,
        roomName: rooms.name,
      })
      .from(decisions)
      .innerJoin(rooms, eq(rooms.id, decisions.roomId))
      .where(and(inArray(decisions.projectId, ids), ne(decisions.status, "locked")))
      .orderBy(asc(decisions.dueDate)),
    db
      .select({ id: boards.id, projectId: boards.projectId, name: boards.name, roomName: rooms.name })
      .from(boards)
      .innerJoin(rooms, eq(rooms.id, boards.roomId))
      .where(inArray(boards.projectId, ids))
      .orderBy(asc(rooms.sortOrder), asc(boards.name)),
  ]);
  return { projects: projectRows, waiting, boards: boardRows };
}

/** Revisions issued to this supplier contact: only those with lines for their company. */
export async function getSupplierHome(actor: Actor) {
  const memberships = actor.projects.filter((p) => p.role === "supplier" && p.supplierId);
  const results = [];
  for (const m of memberships) {
    const supplierId = m.supplierId ?? "";
    const rows = await db
      .select({
        revisionId: specRevisions.id,
        letter: specRevisions.letter,
        issuedAt: specRevisions.issuedAt,
        projectId: projects.id,
        projectName: projects.name,
        lineCount: sql<number>`count(${specLines.id})`,
        acknowledgedAt: supplierAcknowledgements.acknowledgedAt,
      })
      .from(specRevisions)
      .innerJoin(projects, eq(projects.id, specRevisions.projectId))
      .innerJoin(specLines, and(eq(specLines.revisionId, specRevisions.id), eq(specLines.supplierId, supplierId)))
      .leftJoin(
        supplierAcknowledgements,
        and(eq(supplierAcknowledgements.revisionId, specRevisions.id), eq(supplierAcknowledgements.supplierId, supplierId)),
      )
      .where(eq(specRevisions.projectId, m.projectId))
      .groupBy(specRevisions.id)
      .orderBy(desc(specRevisions.sequence));
    results.push(...rows);
  }
  return results;
}
