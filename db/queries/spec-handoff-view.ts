import { and, asc, eq } from "drizzle-orm";
import { db } from "@/db";
import { projectMembers, specRevisions, supplierAcknowledgements, users } from "@/db/schema";
import { diffLines, linesForSupplier, type SpecDiff } from "@/lib/spec/diff";
import { shiftDay } from "@/lib/spec/order-by";
import { isLate, lineStatus, type LineStatus } from "@/lib/spec/status";
import { todayUtc } from "./attention";
import { nameOnProject } from "./people-names";
import { getProjectForStaff } from "./projects";
import { readRevisionLines, type RevisionLine } from "./spec-revisions";
import type { Actor } from "./users";

export type HandoffLine = RevisionLine & { status: LineStatus };
type Ack = { revisionId: string; supplierId: string; acknowledgedAt: Date; byName: string | null; byEmail: string };

async function readProjectAcks(projectId: string): Promise<Ack[]> {
  return db
    .select({
      revisionId: supplierAcknowledgements.revisionId,
      supplierId: supplierAcknowledgements.supplierId,
      acknowledgedAt: supplierAcknowledgements.acknowledgedAt,
      byName: nameOnProject(projectId),
      byEmail: users.email,
    })
    .from(supplierAcknowledgements)
    .innerJoin(specRevisions, eq(specRevisions.id, supplierAcknowledgements.revisionId))
    .innerJoin(users, eq(users.id, supplierAcknowledgements.userId))
    .where(eq(specRevisions.projectId, projectId));
}

/** The project's supplier contacts: who gets the e-mail when a revision is issued. */
export async function readContacts(projectId: string) {
  return db
    .select({ supplierId: projectMembers.supplierId, email: users.email, name: projectMembers.displayName })
    .from(projectMembers)
    .innerJoin(users, eq(users.id, projectMembers.userId))
    .where(and(eq(projectMembers.projectId, projectId), eq(projectMembers.role, "supplier")));
}

/**
 * The designer's hand-off: per supplier, which revisions they acknowledged, what changed for
 * them since their last acknowledgement, and which of their lines in the latest revision are late
 * (not ordered by the order-by date, or arriving after the install) or due to be ordered soon.
 */
export async function getHandoffView(actor: Actor, projectId: string, today = todayUtc(), soonDays = 14) {
  const project = await getProjectForStaff(actor, projectId);
  const revisions = await db
    .select({ id: specRevisions.id, letter: specRevisions.letter, sequence: specRevisions.sequence, issuedAt: specRevisions.issuedAt })
    .from(specRevisions)
    .where(eq(specRevisions.projectId, project.id))
    .orderBy(asc(specRevisions.sequence));
  const latest = revisions.at(-1) ?? null;
  if (!latest) return { project, revisions, latest, suppliers: [], late: [], today };
  const [lineSets, acks, contacts] = await Promise.all([
    Promise.all(revisions.map(async (r) => [r.id, await readRevisionLines(db, r.id)] as const)),
    readProjectAcks(project.id),
    readContacts(project.id),
  ]);
  const linesOf = new Map(lineSets);
  const withStatus = (l: RevisionLine): HandoffLine => ({
    ...l,
    status: lineStatus({ orderByDate: l.orderByDate, order: l.order, today, installDate: project.installDate }),
  });
  const names = new Map<string, string>();
  for (const r of revisions) for (const l of linesOf.get(r.id) ?? []) if (l.supplierId) names.set(l.supplierId, l.supplierName ?? "");
  const soon = shiftDay(today, soonDays);
  const suppliers = [...names].map(([supplierId, supplierName]) => {
    const lines = linesForSupplier(linesOf.get(latest.id) ?? [], supplierId).map(withStatus);
    const acknowledged = revisions.flatMap((r) => {
      const ack = acks.find((a) => a.revisionId === r.id && a.supplierId === supplierId);
      return ack ? [{ ...ack, letter: r.letter }] : [];
    });
    const lastAck = acknowledged.at(-1) ?? null;
    const changesSinceAck: SpecDiff | null =
      lastAck && lastAck.revisionId !== latest.id ? diffLines(linesForSupplier(linesOf.get(lastAck.revisionId) ?? [], supplierId), lines) : null;
    return {
      supplierId,
      supplierName,
      contacts: contacts.filter((c) => c.supplierId === supplierId).map((c) => ({ email: c.email, name: c.name })),
      lines,
      acknowledged,
      upToDate: lines.length > 0 && lastAck?.revisionId === latest.id,
      changesSinceAck,
      late: lines.filter((l) => isLate(l.status)),
      dueSoon: lines.filter((l) => l.status === "not-ordered" && l.orderByDate !== null && l.orderByDate <= soon),
      orderedCount: lines.filter((l) => l.order?.orderedOn).length,
      /** Which revisions had lines for them (for the acknowledgement table). */
      revisionIds: revisions.filter((r) => (linesOf.get(r.id) ?? []).some((l) => l.supplierId === supplierId)).map((r) => r.id),
    };
  });
  suppliers.sort((a, b) => a.supplierName.localeCompare(b.supplierName));
  const late = suppliers.flatMap((s) => s.late);
  return { project, revisions, latest, suppliers, late, today };
}

export type HandoffView = Awaited<ReturnType<typeof getHandoffView>>;
