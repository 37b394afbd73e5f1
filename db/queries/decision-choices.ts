import { and, eq, ne } from "drizzle-orm";
import { approvals, choices, decisions, options, rooms } from "@/db/schema";
import { buildApprovalSnapshot } from "@/lib/decisions/snapshot";
import type { ApproveInput, ChoiceInput } from "@/lib/validation/decision";
import { conflict, forbidden, HttpError } from "@/lib/http";
import { writeAudit } from "./audit";
import { loadLatestChoices } from "./decision-budget";
import { LOCKED_MESSAGE, STALE_MESSAGE } from "./decision-inputs";
import { loadOptionViews } from "./decision-options";
import { getDecisionAccess, getStudioThresholds } from "./decisions";
import { writeTransaction, type Tx } from "./serial-write";
import type { Actor } from "./users";

/** Only the project's clients choose and approve; staff see, but the choice is the client's. */
async function openForClient(tx: Tx, actor: Actor, decisionId: string, version: number | undefined) {
  const access = await getDecisionAccess(actor, decisionId, tx);
  if (access.role !== "client") throw forbidden();
  if (access.decision.status === "locked") throw conflict(LOCKED_MESSAGE);
  if (version !== undefined && version !== access.decision.version) throw conflict(STALE_MESSAGE);
  return access;
}

/** An option of this decision that is offered to the client (not one added later by a variation). */
async function findOfferedOption(tx: Tx, decisionId: string, optionId: string) {
  const [option] = await tx
    .select()
    .from(options)
    .where(and(eq(options.id, optionId), eq(options.decisionId, decisionId), eq(options.addedByVariation, false)));
  if (!option) throw new HttpError(400, "Some fields need attention.", { optionId: ["Choose one of this decision's options."] });
  return option;
}

/**
 * The client picks (or changes their mind, or comments on) an option. Not an approval.
 * Picking again what they already picked, with nothing to say, changes nothing: a double click
 * or a retried request adds no line to the history and no e-mail (`changed: false`).
 */
export async function chooseOption(actor: Actor, decisionId: string, input: ChoiceInput) {
  return writeTransaction(async (tx) => {
    const { decision, project } = await openForClient(tx, actor, decisionId, input.version);
    const option = await findOfferedOption(tx, decision.id, input.optionId);
    const latest = (await loadLatestChoices([decision.id], tx)).get(decision.id);
    if (decision.status === "chosen" && !input.comment && latest?.optionId === option.id && latest.userId === actor.userId) {
      return { decision, project, option, choice: latest, changed: false };
    }
    const [updated] = await tx
      .update(decisions)
      .set({ status: "chosen", version: decision.version + 1 })
      .where(and(eq(decisions.id, decision.id), eq(decisions.version, decision.version), ne(decisions.status, "locked")))
      .returning();
    if (!updated) throw conflict(STALE_MESSAGE);
    const [choice] = await tx
      .insert(choices)
      .values({ decisionId: decision.id, optionId: option.id, userId: actor.userId, comment: input.comment, createdAt: new Date() })
      .returning();
    await writeAudit(
      {
        at: choice?.createdAt,
        studioId: project.studioId,
        projectId: project.id,
        actorId: actor.userId,
        action: "option.chosen",
        entityType: "decision",
        entityId: decision.id,
        detail: { title: decision.title, option: option.label, optionId: option.id, ...(input.comment ? { comment: input.comment } : {}) },
      },
      tx,
    );
    return { decision: updated, project, option, choice, changed: true };
  });
}

/**
 * Approval: explicit confirmation (checked by the schema), a snapshot of exactly what was shown,
 * the lock, the client's pick and the audit entry, all in one transaction. The conditional UPDATE
 * on status and version means that of two approvals racing, exactly one locks; the other is 409.
 */
export async function approveDecision(actor: Actor, decisionId: string, input: ApproveInput) {
  return writeTransaction(async (tx) => {
    const { decision, project } = await openForClient(tx, actor, decisionId, input.version);
    const option = await findOfferedOption(tx, decision.id, input.optionId);
    const views = await loadOptionViews(decision, await getStudioThresholds(project.studioId, tx), tx);
    const view = views.find((v) => v.id === option.id);
    if (!view) throw new Error("approved option has no view");
    const [room] = await tx.select({ name: rooms.name }).from(rooms).where(eq(rooms.id, decision.roomId));
    const snapshot = buildApprovalSnapshot({ ...decision, roomName: room?.name ?? "" }, view);

    const now = new Date();
    const [locked] = await tx
      .update(decisions)
      .set({ status: "locked", lockedOptionId: option.id, lockedAt: now, version: decision.version + 1 })
      .where(and(eq(decisions.id, decision.id), eq(decisions.version, decision.version), ne(decisions.status, "locked")))
      .returning();
    if (!locked) throw conflict(LOCKED_MESSAGE);

    const latest = (await loadLatestChoices([decision.id], tx)).get(decision.id);
    if (latest?.optionId !== option.id) {
      await tx.insert(choices).values({ decisionId: decision.id, optionId: option.id, userId: actor.userId, comment: null, createdAt: now });
    }
    const [approval] = await tx
      .insert(approvals)
      .values({ decisionId: decision.id, optionId: option.id, userId: actor.userId, snapshot, approvedAt: now })
      .returning();
    await writeAudit(
      {
        at: now,
        studioId: project.studioId,
        projectId: project.id,
        actorId: actor.userId,
        action: "decision.approved",
        entityType: "decision",
        entityId: decision.id,
        detail: { title: decision.title, option: option.label, optionId: option.id, priceCents: option.priceCents, allowanceCents: decision.allowanceCents },
      },
      tx,
    );
    return { decision: locked, project, option, approval };
  });
}
