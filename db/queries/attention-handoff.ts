import { and, asc, eq, inArray, isNotNull, isNull, sql } from "drizzle-orm";
import { db } from "@/db";
import { lineOrders, projects, specLines, specRevisions, supplierAcknowledgements } from "@/db/schema";

const LIMIT = 20;

export type LatestRevision = { id: string; projectId: string; projectName: string; letter: string; installDate: string | null };

/** The latest revision of each live project of the studio (the unique project/sequence index answers the max). */
export async function readLatestRevisions(studioId: string): Promise<LatestRevision[]> {
  return db
    .select({ id: specRevisions.id, projectId: projects.id, projectName: projects.name, letter: specRevisions.letter, installDate: projects.installDate })
    .from(specRevisions)
    .innerJoin(projects, eq(projects.id, specRevisions.projectId))
    .where(
      and(
        eq(projects.studioId, studioId),
        isNull(projects.archivedAt),
        sql`${specRevisions.sequence} = (select max(r2."sequence") from "spec_revision" r2 where r2."project_id" = "spec_revision"."project_id")`,
      ),
    )
    .orderBy(asc(projects.name));
}

/**
 * Projects whose specification has moved on since its latest revision: a decision locked, a
 * variation approved, or a fixed item added, changed or removed after it was issued (a fixed
 * item's change is known from the audit log, which every fixed-item write records). A project with
 * locked decisions or fixed items and no revision yet is waiting for revision A.
 */
export async function readSpecsNeedingRevision(studioId: string) {
  const issued = sql`(select max(r."created_at") from "spec_revision" r where r."project_id" = "project"."id")`;
  const changedSince = sql`(
    exists (select 1 from "decision" d where d."project_id" = "project"."id" and d."status" = 'locked' and d."locked_at" > ${issued})
    or exists (select 1 from "variation" v join "decision" d on d."id" = v."decision_id"
               where d."project_id" = "project"."id" and v."status" = 'approved' and v."decided_at" > ${issued})
    or exists (select 1 from "fixed_item" f where f."project_id" = "project"."id" and f."created_at" > ${issued})
    or exists (select 1 from "audit_log" a where a."project_id" = "project"."id" and a."created_at" > ${issued}
               and a."action" in ('fixed-item.added', 'fixed-item.changed', 'fixed-item.removed'))
  )`;
  const hasLines = sql`(
    exists (select 1 from "decision" d where d."project_id" = "project"."id" and d."status" = 'locked')
    or exists (select 1 from "fixed_item" f where f."project_id" = "project"."id")
  )`;
  const rows = await db
    .select({
      projectId: projects.id,
      projectName: projects.name,
      lastLetter: sql<string | null>`(select r."letter" from "spec_revision" r where r."project_id" = "project"."id" order by r."sequence" desc limit 1)`,
      needed: sql<number>`case when ${issued} is null then ${hasLines} else ${changedSince} end`,
    })
    .from(projects)
    .where(and(eq(projects.studioId, studioId), isNull(projects.archivedAt)))
    .orderBy(asc(projects.name));
  return rows.filter((r) => Boolean(r.needed)).map(({ projectId, projectName, lastLetter }) => ({ projectId, projectName, lastLetter }));
}

/** Suppliers with lines in a project's latest revision who have not acknowledged it. */
export async function readUnacknowledged(latest: LatestRevision[]) {
  if (latest.length === 0) return [];
  const byId = new Map(latest.map((r) => [r.id, r]));
  const rows = await db
    .select({ revisionId: specLines.revisionId, supplierId: specLines.supplierId, supplierName: specLines.supplierName, lineCount: sql<number>`count(*)` })
    .from(specLines)
    .leftJoin(
      supplierAcknowledgements,
      and(eq(supplierAcknowledgements.revisionId, specLines.revisionId), eq(supplierAcknowledgements.supplierId, specLines.supplierId)),
    )
    .where(and(inArray(specLines.revisionId, [...byId.keys()]), isNotNull(specLines.supplierId), isNull(supplierAcknowledgements.id)))
    .groupBy(specLines.revisionId, specLines.supplierId)
    .orderBy(asc(specLines.supplierName))
    .limit(LIMIT);
  return rows.flatMap((r) => {
    const rev = byId.get(r.revisionId);
    return rev ? [{ ...rev, revisionId: rev.id, supplierId: r.supplierId ?? "", supplierName: r.supplierName ?? "", lineCount: r.lineCount }] : [];
  });
}

/**
 * Lines of a latest revision that can no longer arrive as planned: not ordered by their order-by
 * date, or expected after the install date (the same rule as lib/spec/status.ts).
 */
export async function readLateLines(latest: LatestRevision[], today: string) {
  if (latest.length === 0) return [];
  const byId = new Map(latest.map((r) => [r.id, r]));
  const rows = await db
    .select({
      id: specLines.id,
      revisionId: specLines.revisionId,
      item: specLines.item,
      room: specLines.room,
      supplierName: specLines.supplierName,
      orderByDate: specLines.orderByDate,
      orderedOn: lineOrders.orderedOn,
      expectedOn: lineOrders.expectedOn,
      installDate: projects.installDate,
    })
    .from(specLines)
    .innerJoin(specRevisions, eq(specRevisions.id, specLines.revisionId))
    .innerJoin(projects, eq(projects.id, specRevisions.projectId))
    .leftJoin(lineOrders, eq(lineOrders.lineId, specLines.id))
    .where(
      and(
        inArray(specLines.revisionId, [...byId.keys()]),
        sql`((${lineOrders.orderedOn} is null and ${specLines.orderByDate} < ${today})
             or (${lineOrders.orderedOn} is not null and ${lineOrders.expectedOn} > ${projects.installDate}))`,
      ),
    )
    .orderBy(asc(specLines.orderByDate), asc(specLines.item))
    .limit(LIMIT);
  return rows.flatMap((r) => {
    const rev = byId.get(r.revisionId);
    const kind = r.orderedOn ? ("arrives-late" as const) : ("order-overdue" as const);
    return rev ? [{ ...r, kind, projectId: rev.projectId, projectName: rev.projectName, letter: rev.letter }] : [];
  });
}
