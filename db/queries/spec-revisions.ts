import { and, asc, desc, eq, gt, lt, sql } from "drizzle-orm";
import { db } from "@/db";
import { lineOrders, projects, specLines, specRevisions, supplierAcknowledgements, users, type Project, type SpecRevision } from "@/db/schema";
import { projectRole, supplierIdFor } from "@/lib/auth/permissions";
import { forbidden, notFound } from "@/lib/http";
import { pickLineContent } from "@/lib/spec/revision-content";
import type { SpecLineContent } from "@/lib/spec/types";
import { nameOnProject } from "./people-names";
import type { Reader } from "./spec-source";
import type { Actor } from "./users";

export type LineOrderDates = { orderedOn: string | null; expectedOn: string | null };
export type RevisionLine = SpecLineContent & { id: string; order: LineOrderDates | null };

/** Staff see every line of a revision; a supplier's contact sees only their company's lines. */
export type RevisionScope = { kind: "all" } | { kind: "supplier"; supplierId: string };

export async function readRevisionLines(reader: Reader, revisionId: string, supplierId?: string): Promise<RevisionLine[]> {
  const rows = await reader
    .select({ line: specLines, orderedOn: lineOrders.orderedOn, expectedOn: lineOrders.expectedOn, orderedAt: lineOrders.updatedAt })
    .from(specLines)
    .leftJoin(lineOrders, eq(lineOrders.lineId, specLines.id))
    .where(and(eq(specLines.revisionId, revisionId), supplierId ? eq(specLines.supplierId, supplierId) : undefined))
    .orderBy(asc(specLines.sortOrder), asc(specLines.lineKey));
  return rows.map(({ line, orderedOn, expectedOn, orderedAt }) => ({
    id: line.id,
    ...pickLineContent(line),
    order: orderedAt ? { orderedOn, expectedOn } : null,
  }));
}

/**
 * The one way to open a revision. Other studios and strangers get 404 (as for the project);
 * the project's clients get 403 (the specification is the trades' document, see README);
 * a supplier's contact gets 404 for a revision with no lines for their company.
 */
export async function openRevision(actor: Actor, revisionId: string): Promise<{ revision: SpecRevision; project: Project; scope: RevisionScope }> {
  const [row] = await db
    .select({ revision: specRevisions, project: projects })
    .from(specRevisions)
    .innerJoin(projects, eq(projects.id, specRevisions.projectId))
    .where(eq(specRevisions.id, revisionId))
    .limit(1);
  if (!row) throw notFound("That revision");
  const { revision, project } = row;
  const role = projectRole(actor, project.id, project.studioId);
  if (!role) throw notFound("That revision");
  if (role === "client") throw forbidden();
  if (role === "staff") return { revision, project, scope: { kind: "all" } };
  const supplierId = supplierIdFor(actor, project.id);
  if (!supplierId || !(await revisionHasLinesFor(revision.id, supplierId))) throw notFound("That revision");
  return { revision, project, scope: { kind: "supplier", supplierId } };
}

export async function revisionHasLinesFor(revisionId: string, supplierId: string): Promise<boolean> {
  const rows = await db
    .select({ id: specLines.id })
    .from(specLines)
    .where(and(eq(specLines.revisionId, revisionId), eq(specLines.supplierId, supplierId)))
    .limit(1);
  return rows.length > 0;
}

export async function readLatestRevision(reader: Reader, projectId: string): Promise<SpecRevision | null> {
  const [latest] = await reader
    .select()
    .from(specRevisions)
    .where(eq(specRevisions.projectId, projectId))
    .orderBy(desc(specRevisions.sequence))
    .limit(1);
  return latest ?? null;
}

/**
 * "before": the revision just before this one; "after": the newest one after it (what replaces it).
 * With a supplier, only revisions that have lines for them count.
 */
export async function readNeighbour(revision: SpecRevision, direction: "before" | "after", supplierId?: string) {
  const hasLines = supplierId
    ? sql`exists (select 1 from "spec_line" l where l."revision_id" = "spec_revision"."id" and l."supplier_id" = ${supplierId})`
    : undefined;
  const [row] = await db
    .select({ id: specRevisions.id, letter: specRevisions.letter, sequence: specRevisions.sequence })
    .from(specRevisions)
    .where(
      and(
        eq(specRevisions.projectId, revision.projectId),
        direction === "before" ? lt(specRevisions.sequence, revision.sequence) : gt(specRevisions.sequence, revision.sequence),
        hasLines,
      ),
    )
    .orderBy(desc(specRevisions.sequence))
    .limit(1);
  return row ?? null;
}

export async function readIssuerName(userId: string): Promise<string> {
  const user = await db.query.users.findFirst({ where: eq(users.id, userId), columns: { name: true, email: true } });
  return user?.name ?? user?.email ?? "Unknown";
}

export async function readAcknowledgements(revisionId: string, supplierId?: string) {
  const projectOfRevision = sql`(select r."project_id" from "spec_revision" r where r."id" = ${revisionId})`;
  return db
    .select({
      supplierId: supplierAcknowledgements.supplierId,
      acknowledgedAt: supplierAcknowledgements.acknowledgedAt,
      byName: nameOnProject(projectOfRevision),
      byEmail: users.email,
    })
    .from(supplierAcknowledgements)
    .innerJoin(users, eq(users.id, supplierAcknowledgements.userId))
    .where(and(eq(supplierAcknowledgements.revisionId, revisionId), supplierId ? eq(supplierAcknowledgements.supplierId, supplierId) : undefined))
    .orderBy(asc(supplierAcknowledgements.acknowledgedAt));
}
