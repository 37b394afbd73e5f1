import { and, eq } from "drizzle-orm";
import { db } from "@/db";
import { lineConfirmations, lineOrders, specLines, studioMembers, supplierAcknowledgements, suppliers, users } from "@/db/schema";
import { conflict, forbidden, HttpError, notFound } from "@/lib/http";
import { formatDay } from "@/lib/format";
import { supersededReason } from "@/lib/spec/line-change";
import { shiftDay } from "@/lib/spec/order-by";
import { lineStatus } from "@/lib/spec/status";
import type { LineConfirmationInput } from "@/lib/validation/line-confirmation";
import { frozenLineFields, type LineOrderInput } from "@/lib/validation/spec";
import { todayUtc } from "./attention";
import { writeAudit } from "./audit";
import { writeTransaction } from "./serial-write";
import type { Reader } from "./spec-source";
import { readLineChange } from "./spec-line-changes";
import { openRevision, readLatestRevision } from "./spec-revisions";
import type { Actor } from "./users";

async function readSupplierName(supplierId: string) {
  const supplier = await db.query.suppliers.findFirst({ where: eq(suppliers.id, supplierId), columns: { name: true } });
  return supplier?.name ?? "The supplier";
}

/** Who hears of an acknowledgement: the staff of the project's studio. */
async function readStudioEmails(studioId: string) {
  const rows = await db
    .select({ email: users.email })
    .from(studioMembers)
    .innerJoin(users, eq(users.id, studioMembers.userId))
    .where(eq(studioMembers.studioId, studioId));
  return rows.map((r) => r.email);
}

/**
 * A supplier's contact confirms they received a revision. Once per revision and supplier: asking
 * again answers the first acknowledgement (created: false) and sends nothing new.
 */
export async function acknowledgeRevision(actor: Actor, revisionId: string) {
  const { revision, project, scope } = await openRevision(actor, revisionId);
  if (scope.kind !== "supplier") throw forbidden();
  const { supplierId } = scope;
  const created = await writeTransaction(async (tx) => {
    const [row] = await tx
      .insert(supplierAcknowledgements)
      .values({ revisionId: revision.id, supplierId, userId: actor.userId })
      .onConflictDoNothing()
      .returning();
    if (!row) return null;
    await writeAudit(
      {
        studioId: project.studioId,
        projectId: project.id,
        actorId: actor.userId,
        action: "revision.acknowledged",
        at: row.acknowledgedAt,
        entityType: "spec_revision",
        entityId: revision.id,
        detail: { letter: revision.letter, supplierId },
      },
      tx,
    );
    return row;
  });
  const acknowledgement =
    created ??
    (await db.query.supplierAcknowledgements.findFirst({
      where: and(eq(supplierAcknowledgements.revisionId, revision.id), eq(supplierAcknowledgements.supplierId, supplierId)),
    }));
  if (!acknowledgement) throw new Error("acknowledgement vanished");
  const [supplierName, designerEmails] = await Promise.all([readSupplierName(supplierId), readStudioEmails(project.studioId)]);
  return { created: created !== null, acknowledgement, revision, project, supplierName, designerEmails };
}

function checkOrderDates(orderedOn: string | null, expectedOn: string | null, today: string) {
  const errors: Record<string, string[]> = {};
  // A day's grace: the supplier's calendar may already be on tomorrow while the server's UTC is not.
  if (orderedOn && orderedOn > shiftDay(today, 1)) errors.orderedOn = ["The order date can't be in the future. Record it once the order is placed."];
  if (expectedOn && !orderedOn) errors.expectedOn = ["Enter the date you ordered first, then the expected delivery."];
  if (expectedOn && orderedOn && expectedOn < orderedOn) errors.expectedOn = ["Delivery can't be expected before the order date."];
  if (Object.keys(errors).length) throw new HttpError(400, "Some dates need attention.", errors);
}

/** Refuses, with 409, a request that tries to change the frozen content of an issued line. */
export function refuseContentEdits(body: unknown) {
  if (body && typeof body === "object" && frozenLineFields.some((f) => Object.hasOwn(body, f))) {
    throw conflict("An issued revision never changes. Change the specification and issue a new revision instead.");
  }
}

/**
 * A supplier records when they ordered a line and when they expect it, on the latest revision,
 * after acknowledging it. The dates live beside the frozen line, never in it.
 */
export async function recordLineOrder(actor: Actor, revisionId: string, lineId: string, input: LineOrderInput, today = todayUtc()) {
  const { revision, project, scope } = await openRevision(actor, revisionId);
  if (scope.kind !== "supplier") throw forbidden();
  const line = await db.query.specLines.findFirst({ where: and(eq(specLines.id, lineId), eq(specLines.revisionId, revision.id)) });
  if (!line || line.supplierId !== scope.supplierId) throw notFound("That line");
  const latest = await readLatestRevision(db, project.id);
  if (latest && latest.id !== revision.id) {
    throw conflict(`Revision ${latest.letter} replaces revision ${revision.letter}. Record order dates on revision ${latest.letter}.`);
  }
  const acknowledged = await db.query.supplierAcknowledgements.findFirst({
    where: and(eq(supplierAcknowledgements.revisionId, revision.id), eq(supplierAcknowledgements.supplierId, scope.supplierId)),
  });
  if (!acknowledged) throw conflict(`Acknowledge revision ${revision.letter} before recording order dates.`);
  await refuseSupersededLine(db, revision, line);
  const existing = await db.query.lineOrders.findFirst({ where: eq(lineOrders.lineId, line.id) });
  const orderedOn = input.orderedOn === undefined ? (existing?.orderedOn ?? null) : input.orderedOn;
  const expectedOn = input.expectedOn === undefined ? (existing?.expectedOn ?? null) : input.expectedOn;
  checkOrderDates(orderedOn, expectedOn, today);
  const values = { lineId: line.id, orderedOn, expectedOn, updatedBy: actor.userId, updatedAt: new Date() };
  await writeTransaction(async (tx) => {
    await refuseSupersededLine(tx, revision, line);
    await tx.insert(lineOrders).values(values).onConflictDoUpdate({ target: lineOrders.lineId, set: { orderedOn, expectedOn, updatedBy: actor.userId, updatedAt: values.updatedAt } });
    await writeAudit(
      {
        studioId: project.studioId,
        projectId: project.id,
        actorId: actor.userId,
        action: "line.order-dates",
        at: values.updatedAt,
        entityType: "spec_line",
        entityId: line.id,
        detail: { letter: revision.letter, item: line.item, orderedOn, expectedOn, before: existing ? { orderedOn: existing.orderedOn, expectedOn: existing.expectedOn } : null },
      },
      tx,
    );
  });
  const status = lineStatus({ orderByDate: line.orderByDate, order: { orderedOn, expectedOn }, today, installDate: project.installDate });
  return { lineId: line.id, orderedOn, expectedOn, status };
}

type RevisionRef = { id: string; letter: string; projectId: string; issuedAt: Date };

/**
 * An approved variation overtook this line after it was issued: nobody orders it until a new
 * revision is issued or the designer confirms it stands (409, saying why). Read inside the write,
 * so a variation approved a moment earlier is seen.
 */
async function refuseSupersededLine(reader: Reader, revision: RevisionRef, line: { id: string; lineKey: string; finishId: string | null }) {
  const change = await readLineChange(reader, revision, line);
  if (change?.state === "superseded") {
    throw conflict(supersededReason(revision.letter, change, change.variedAt ? formatDay(change.variedAt.slice(0, 10)) : null));
  }
}

/**
 * The designer's word that an issued line stands although an approved variation changed its
 * decision: the supplier may order it again without waiting for the next revision. Only on the
 * latest revision, only for a line that needs it; confirming again (after a later variation)
 * replaces the earlier confirmation. Audited in the same transaction.
 */
export async function confirmLineStands(actor: Actor, revisionId: string, lineId: string, input: LineConfirmationInput) {
  const { revision, project, scope } = await openRevision(actor, revisionId);
  if (scope.kind !== "all") throw forbidden();
  const line = await db.query.specLines.findFirst({ where: and(eq(specLines.id, lineId), eq(specLines.revisionId, revision.id)) });
  if (!line) throw notFound("That line");
  return writeTransaction(async (tx) => {
    const latest = await readLatestRevision(tx, project.id);
    if (latest && latest.id !== revision.id) {
      throw conflict(`Revision ${latest.letter} replaces revision ${revision.letter}, so its lines are the ones suppliers order from.`);
    }
    const change = await readLineChange(tx, revision, line);
    if (!change) throw conflict("Nothing has changed this line since it was issued, so there is nothing to confirm.");
    if (change.state === "confirmed") return { created: false, confirmation: { lineId: line.id, confirmedAt: change.confirmedAt, note: change.note } };
    const confirmedAt = new Date();
    const values = { lineId: line.id, confirmedBy: actor.userId, note: input.note, confirmedAt };
    await tx.insert(lineConfirmations).values(values).onConflictDoUpdate({ target: lineConfirmations.lineId, set: { confirmedBy: actor.userId, note: input.note, confirmedAt } });
    await writeAudit(
      {
        studioId: project.studioId,
        projectId: project.id,
        actorId: actor.userId,
        action: "line.confirmed",
        entityType: "spec_line",
        entityId: line.id,
        at: confirmedAt,
        detail: { letter: revision.letter, item: line.item, lineKey: line.lineKey, ...(input.note ? { note: input.note } : {}) },
      },
      tx,
    );
    return { created: true, confirmation: { lineId: line.id, confirmedAt: confirmedAt.toISOString(), note: input.note } };
  });
}
