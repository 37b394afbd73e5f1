import { and, eq, inArray, ne } from "drizzle-orm";
import { choices, decisions, optionLines, options } from "@/db/schema";
import type { CreateDecisionInput, UpdateDecisionInput } from "@/lib/validation/decision";
import { conflict, forbidden, HttpError } from "@/lib/http";
import { writeAudit } from "./audit";
import { loadLatestChoices } from "./decision-budget";
import { checkOptionInputs, insertLines, insertOption, LOCKED_MESSAGE, resolveOptionPrice, resolveRoom, STALE_MESSAGE } from "./decision-inputs";
import { getDecisionAccess } from "./decisions";
import { getProjectForStaff } from "./projects";
import { writeTransaction } from "./serial-write";
import type { Actor } from "./users";

const optionPath = (i: number) => `options.${i}`;

/** A designer opens a decision with its options, in one transaction. */
export async function createDecision(actor: Actor, projectId: string, input: CreateDecisionInput) {
  const project = await getProjectForStaff(actor, projectId);
  return writeTransaction(async (tx) => {
    const roomId = await resolveRoom(tx, project.id, input.room);
    await checkOptionInputs(tx, project.studioId, project.id, input.options, optionPath);
    const [decision] = await tx
      .insert(decisions)
      .values({ projectId: project.id, roomId, title: input.title, allowanceCents: input.allowanceCents, dueDate: input.dueDate })
      .returning();
    if (!decision) throw new Error("decision insert returned nothing");
    for (const [i, o] of input.options.entries()) await insertOption(tx, decision.id, o, i);
    await writeAudit(
      {
        studioId: project.studioId,
        projectId: project.id,
        actorId: actor.userId,
        action: "decision.created",
        entityType: "decision",
        entityId: decision.id,
        detail: { title: decision.title, options: input.options.map((o) => o.label), allowanceCents: decision.allowanceCents, dueDate: decision.dueDate },
      },
      tx,
    );
    return { decision, project };
  });
}

/**
 * Edits a decision that isn't approved yet. Options keep their ids (and the client's picks of
 * them); options left out are removed. Refused with 409 once locked, or when someone changed it
 * after the designer opened it (version).
 */
export async function updateDecision(actor: Actor, decisionId: string, input: UpdateDecisionInput, today: string) {
  return writeTransaction(async (tx) => {
    const { decision, project, role } = await getDecisionAccess(actor, decisionId, tx);
    if (role !== "staff") throw forbidden();
    if (decision.status === "locked") throw conflict(LOCKED_MESSAGE);
    if (decision.version !== input.version) throw conflict(STALE_MESSAGE);
    if (input.dueDate !== decision.dueDate && input.dueDate < today) {
      throw new HttpError(400, "Some fields need attention.", { dueDate: ["The due date can't be in the past."] });
    }
    const roomId = await resolveRoom(tx, project.id, input.room);
    await checkOptionInputs(tx, project.studioId, project.id, input.options, optionPath);
    const existing = await tx.select({ id: options.id }).from(options).where(eq(options.decisionId, decision.id));
    const existingIds = new Set(existing.map((o) => o.id));
    const kept = input.options.map((o) => o.id).filter((id): id is string => Boolean(id && existingIds.has(id)));

    const [updated] = await tx
      .update(decisions)
      .set({ roomId, title: input.title, allowanceCents: input.allowanceCents, dueDate: input.dueDate, version: decision.version + 1 })
      .where(and(eq(decisions.id, decision.id), eq(decisions.version, decision.version), ne(decisions.status, "locked")))
      .returning();
    if (!updated) throw conflict(STALE_MESSAGE);

    // Explicit deletes rather than relying on ON DELETE CASCADE, which needs foreign_keys on
    // for every pooled connection.
    const removed = [...existingIds].filter((id) => !kept.includes(id));
    if (removed.length) {
      await tx.delete(choices).where(inArray(choices.optionId, removed));
      await tx.delete(optionLines).where(inArray(optionLines.optionId, removed));
      await tx.delete(options).where(inArray(options.id, removed));
    }
    if (kept.length) await tx.delete(optionLines).where(inArray(optionLines.optionId, kept));
    for (const [i, o] of input.options.entries()) {
      if (o.id && existingIds.has(o.id)) {
        const price = await resolveOptionPrice(tx, decision.id, o);
        await tx
          .update(options)
          .set({ label: o.label, ...price, notes: o.notes, boardId: o.boardId, sortOrder: i })
          .where(eq(options.id, o.id));
        await insertLines(tx, o.id, o.lines);
      } else {
        await insertOption(tx, decision.id, o, i);
      }
    }
    // A removed option takes its picks with it; the status follows whatever pick is left.
    const latest = (await loadLatestChoices([decision.id], tx)).get(decision.id);
    const status = latest ? "chosen" : "open";
    if (status !== updated.status) await tx.update(decisions).set({ status }).where(eq(decisions.id, decision.id));

    await writeAudit(
      {
        studioId: project.studioId,
        projectId: project.id,
        actorId: actor.userId,
        action: "decision.updated",
        entityType: "decision",
        entityId: decision.id,
        detail: { title: input.title, version: updated.version, options: input.options.map((o) => o.label) },
      },
      tx,
    );
    return { decision: { ...updated, status }, project };
  });
}

/** "Send to client": the decision stays as it is; the clients get an e-mail (sent by the caller). */
export async function markDecisionSent(actor: Actor, decisionId: string) {
  return writeTransaction(async (tx) => {
    const { decision, project, role } = await getDecisionAccess(actor, decisionId, tx);
    if (role !== "staff") throw forbidden();
    if (decision.status === "locked") throw conflict(LOCKED_MESSAGE);
    await writeAudit(
      { studioId: project.studioId, projectId: project.id, actorId: actor.userId, action: "decision.sent", entityType: "decision", entityId: decision.id, detail: { title: decision.title } },
      tx,
    );
    return { decision, project };
  });
}
