import { and, desc, eq, lt, sql } from "drizzle-orm";
import { db } from "@/db";
import { specLines, specRevisions, supplierAcknowledgements, users } from "@/db/schema";
import { forbidden } from "@/lib/http";
import { diffLines, linesForSupplier, type SpecDiff } from "@/lib/spec/diff";
import { verifyRevision } from "@/lib/spec/revision-content";
import { noFinishDetail, type LineFinishDetail } from "@/lib/spec/line-detail";
import type { LineChange } from "@/lib/spec/line-change";
import { lineStatus, type LineStatus } from "@/lib/spec/status";
import { getProjectForActor } from "./projects";
import { readLineFinishDetails, readStudioContact } from "./spec-line-detail";
import { todayUtc } from "./attention";
import { readLineChanges } from "./spec-line-changes";
import { openRevision, readAcknowledgements, readIssuerName, readLatestRevision, readNeighbour, readRevisionLines, type RevisionLine } from "./spec-revisions";
import type { Actor } from "./users";

export type RevisionSummary = {
  id: string;
  letter: string;
  sequence: number;
  issuedAt: Date;
  issuedBy: string;
  sha256: string;
  lineCount: number;
  acknowledgedAt: Date | null;
};

/** Revisions of a project the caller may see, newest first: all for staff, those with their lines for a supplier. */
export async function listRevisionsForActor(actor: Actor, projectId: string): Promise<RevisionSummary[]> {
  const { project, role } = await getProjectForActor(actor, projectId);
  if (role === "client") throw forbidden();
  const supplierId = role === "supplier" ? (actor.projects.find((p) => p.projectId === project.id)?.supplierId ?? "") : null;
  const lineFilter = supplierId === null ? sql`1` : sql`l."supplier_id" = ${supplierId}`;
  const rows = await db
    .select({
      id: specRevisions.id,
      letter: specRevisions.letter,
      sequence: specRevisions.sequence,
      issuedAt: specRevisions.issuedAt,
      sha256: specRevisions.sha256,
      issuedBy: sql<string>`coalesce(${users.name}, ${users.email})`,
      lineCount: sql<number>`(select count(*) from "spec_line" l where l."revision_id" = "spec_revision"."id" and ${lineFilter})`,
      acknowledgedAt: supplierAcknowledgements.acknowledgedAt,
    })
    .from(specRevisions)
    .innerJoin(users, eq(users.id, specRevisions.issuedBy))
    .leftJoin(
      supplierAcknowledgements,
      and(eq(supplierAcknowledgements.revisionId, specRevisions.id), eq(supplierAcknowledgements.supplierId, supplierId ?? "")),
    )
    .where(eq(specRevisions.projectId, project.id))
    .orderBy(desc(specRevisions.sequence));
  return supplierId === null ? rows : rows.filter((r) => r.lineCount > 0);
}

/**
 * A line as a screen shows it: the frozen content, order dates, status, the finish's surface,
 * format and photo, and whether an approved variation has overtaken it since it was issued.
 */
export type ViewLine = RevisionLine & LineFinishDetail & { status: LineStatus; change: LineChange | null };

/** The latest earlier revision this supplier acknowledged: what "changed for you" is measured from. */
async function readLastAcknowledgedBefore(projectId: string, sequence: number, supplierId: string) {
  const [row] = await db
    .select({ id: specRevisions.id, letter: specRevisions.letter })
    .from(specRevisions)
    .innerJoin(
      supplierAcknowledgements,
      and(eq(supplierAcknowledgements.revisionId, specRevisions.id), eq(supplierAcknowledgements.supplierId, supplierId)),
    )
    .where(and(eq(specRevisions.projectId, projectId), lt(specRevisions.sequence, sequence)))
    .orderBy(desc(specRevisions.sequence))
    .limit(1);
  return row ?? null;
}

async function readSupplierNames(revisionId: string) {
  return db
    .select({ supplierId: specLines.supplierId, supplierName: specLines.supplierName, lineCount: sql<number>`count(*)` })
    .from(specLines)
    .where(and(eq(specLines.revisionId, revisionId), sql`${specLines.supplierId} is not null`))
    .groupBy(specLines.supplierId)
    .orderBy(specLines.supplierName);
}

/**
 * A revision as the caller may see it: the hash and whether it checks out, the lines (a supplier
 * gets only theirs) with their order status, acknowledgements, and what changed: since the
 * previous revision for staff, since the supplier's last acknowledged revision for a supplier.
 */
export async function getRevisionView(actor: Actor, revisionId: string, today = todayUtc()) {
  const { revision, project, scope } = await openRevision(actor, revisionId);
  const supplierId = scope.kind === "supplier" ? scope.supplierId : undefined;
  const allLines = await readRevisionLines(db, revision.id);
  const verified = verifyRevision({ ...revision, lines: allLines });
  const visible = supplierId ? linesForSupplier(allLines, supplierId) : allLines;
  // Read for the visible lines only: a supplier never learns anything of another supplier's finishes.
  const [details, latest] = await Promise.all([readLineFinishDetails(visible.map((l) => l.finishId)), readLatestRevision(db, project.id)]);
  // Only the latest revision's lines can be overtaken one by one; an older revision is replaced whole.
  const lineChanges = latest?.id === revision.id ? await readLineChanges(db, revision, visible) : new Map<string, LineChange>();
  const lines: ViewLine[] = visible.map((l) => ({
    ...l,
    ...(details.get(l.finishId ?? "") ?? noFinishDetail),
    status: lineStatus({ orderByDate: l.orderByDate, order: l.order, today, installDate: project.installDate }),
    change: lineChanges.get(l.id) ?? null,
  }));
  const baseline = supplierId
    ? await readLastAcknowledgedBefore(project.id, revision.sequence, supplierId)
    : await readNeighbour(revision, "before");
  let changes: SpecDiff | null = null;
  if (baseline) {
    const before = await readRevisionLines(db, baseline.id, supplierId);
    changes = diffLines(before, visible);
  }
  const [issuedBy, contact, acknowledgements, newer, suppliers] = await Promise.all([
    readIssuerName(revision.issuedBy),
    readStudioContact(project.studioId, revision.issuedBy),
    readAcknowledgements(revision.id, supplierId),
    readNeighbour(revision, "after", supplierId),
    supplierId ? Promise.resolve([]) : readSupplierNames(revision.id),
  ]);
  return {
    revision: { id: revision.id, letter: revision.letter, sequence: revision.sequence, issuedAt: revision.issuedAt, sha256: revision.sha256 },
    content: scope.kind === "all" ? revision.content : null,
    verified,
    issuedBy,
    contact,
    project: { id: project.id, name: project.name, siteAddress: project.siteAddress, installDate: project.installDate },
    scope,
    lines,
    acknowledgements,
    baseline,
    changes,
    newer,
    suppliers: suppliers.map((s) => ({ supplierId: s.supplierId ?? "", supplierName: s.supplierName ?? "", lineCount: s.lineCount })),
    today,
  };
}

export type RevisionView = Awaited<ReturnType<typeof getRevisionView>>;

/**
 * Lines of the project's latest revision that an approved variation has overtaken (and those the
 * designer confirmed), for the studio's specification page. Null before the first revision.
 */
export async function listChangedIssuedLines(actor: Actor, projectId: string) {
  const { project, role } = await getProjectForActor(actor, projectId);
  if (role !== "staff") throw forbidden();
  const latest = await readLatestRevision(db, project.id);
  if (!latest) return null;
  const lines = await readRevisionLines(db, latest.id);
  const changes = await readLineChanges(db, latest, lines);
  return {
    revision: { id: latest.id, letter: latest.letter },
    lines: lines.flatMap((l) => {
      const change = changes.get(l.id);
      return change ? [{ id: l.id, item: l.item, room: l.room, location: l.location, finishName: l.finishName, supplierName: l.supplierName, change }] : [];
    }),
  };
}
