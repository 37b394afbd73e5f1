import { and, eq, inArray, max } from "drizzle-orm";
import { db } from "@/db";
import { approvals, decisions, options, variations, type Variation } from "@/db/schema";
import { buildVariationSnapshot } from "@/lib/decisions/snapshot";
import type { VariationApproveInput, VariationPriceInput, VariationRequestInput } from "@/lib/validation/decision";
import { conflict, forbidden, HttpError, notFound } from "@/lib/http";
import { writeAudit } from "./audit";
import { checkOptionInputs, insertOption } from "./decision-inputs";
import { loadOptionViews } from "./decision-options";
import { getDecisionAccess, getStudioThresholds, type DecisionAccess } from "./decisions";
import { writeTransaction, type Tx } from "./serial-write";
import type { Actor } from "./users";

const NOT_LOCKED = "This decision isn't approved yet, so it can still be changed directly; a variation is for after approval.";
const OPEN_STATUSES = ["requested", "priced"] as const;

const finished = (v: Variation) =>
  conflict(`This variation is already ${v.status}. Ask for a new one if something should still change.`);

/** The audit row carries the time the variation's own record gives the step (asked, priced, decided). */
function audit(tx: Tx, actor: Actor, access: DecisionAccess, action: string, v: { id: string }, at: Date, detail: Record<string, unknown>) {
  const { decision, project } = access;
  return writeAudit(
    { studioId: project.studioId, projectId: project.id, actorId: actor.userId, action, entityType: "variation", entityId: v.id, at, detail: { title: decision.title, decisionId: decision.id, ...detail } },
    tx,
  );
}

/** A change after lock, asked for by a client or a designer, with a reason. */
export async function requestVariation(actor: Actor, decisionId: string, input: VariationRequestInput) {
  return writeTransaction(async (tx) => {
    const access = await getDecisionAccess(actor, decisionId, tx);
    const { decision } = access;
    if (decision.status !== "locked") throw conflict(NOT_LOCKED);
    const [open] = await tx.select({ id: variations.id }).from(variations)
      .where(and(eq(variations.decisionId, decision.id), inArray(variations.status, [...OPEN_STATUSES])));
    if (open) throw conflict("A variation to this decision is already under way. Finish or withdraw it before asking for another.");
    if (input.optionId) {
      const [option] = await tx.select({ id: options.id }).from(options).where(and(eq(options.id, input.optionId), eq(options.decisionId, decision.id)));
      if (!option || option.id === decision.lockedOptionId) {
        throw new HttpError(400, "Some fields need attention.", { optionId: ["Choose another of this decision's options, or leave it empty."] });
      }
    }
    const [variation] = await tx
      .insert(variations)
      .values({ decisionId: decision.id, requestedBy: actor.userId, reason: input.reason, optionId: input.optionId, createdAt: new Date() })
      .returning();
    if (!variation) throw new Error("variation insert returned nothing");
    await audit(tx, actor, access, "variation.requested", variation, variation.createdAt, { reason: input.reason });
    return { ...access, variation };
  });
}

/** A variation of a decision: 404 unless both ids belong together and the person may see them. */
export async function getVariationAccess(actor: Actor, decisionId: string, variationId: string, tx?: Tx) {
  const access = await getDecisionAccess(actor, decisionId, tx);
  const reader = tx ?? db;
  const [variation] = await reader.select().from(variations).where(and(eq(variations.id, variationId), eq(variations.decisionId, decisionId)));
  if (!variation) throw notFound("That variation");
  return { ...access, variation };
}

/** The designer prices the change: the difference including GST, the time impact, and the option it carries. */
export async function priceVariation(actor: Actor, decisionId: string, variationId: string, input: VariationPriceInput) {
  return writeTransaction(async (tx) => {
    const access = await getVariationAccess(actor, decisionId, variationId, tx);
    const { decision, project, variation } = access;
    if (access.role !== "staff") throw forbidden();
    if (!(OPEN_STATUSES as readonly string[]).includes(variation.status)) throw finished(variation);
    let optionId = decision.lockedOptionId;
    if (input.newOption) {
      await checkOptionInputs(tx, project.studioId, project.id, [input.newOption], () => "newOption");
      const [last] = await tx.select({ n: max(options.sortOrder) }).from(options).where(eq(options.decisionId, decision.id));
      optionId = (await insertOption(tx, decision.id, input.newOption, (last?.n ?? 0) + 1, true)).id;
    } else if (input.optionId) {
      const [option] = await tx.select({ id: options.id }).from(options).where(and(eq(options.id, input.optionId), eq(options.decisionId, decision.id)));
      if (!option) throw new HttpError(400, "Some fields need attention.", { optionId: ["Choose one of this decision's options."] });
      optionId = option.id;
    }
    const [priced] = await tx
      .update(variations)
      .set({ status: "priced", priceDeltaCents: input.priceDeltaCents, timeImpactDays: input.timeImpactDays, optionId, pricedBy: actor.userId, pricedAt: new Date() })
      .where(and(eq(variations.id, variation.id), inArray(variations.status, [...OPEN_STATUSES])))
      .returning();
    if (!priced) throw finished(variation);
    await audit(tx, actor, access, "variation.priced", priced, priced.pricedAt ?? new Date(), { priceDeltaCents: input.priceDeltaCents, timeImpactDays: input.timeImpactDays, optionId });
    return { ...access, variation: priced };
  });
}

/**
 * The client approves the priced variation with the same explicit confirmation as a first
 * approval. Only now does the decision carry the new option; the first approval stays as it was.
 */
export async function approveVariation(actor: Actor, decisionId: string, variationId: string, input: VariationApproveInput) {
  return writeTransaction(async (tx) => {
    const access = await getVariationAccess(actor, decisionId, variationId, tx);
    const { decision, project, variation } = access;
    if (access.role !== "client") throw forbidden();
    if (variation.status !== "priced" || !variation.pricedAt || !variation.optionId) {
      throw variation.status === "requested" ? conflict("This variation hasn't been priced yet.") : finished(variation);
    }
    if (input.pricedAt !== undefined && input.pricedAt !== variation.pricedAt.getTime()) {
      throw conflict("The price of this variation changed since you opened it. Look at it again, then try once more.");
    }
    const views = await loadOptionViews(decision, await getStudioThresholds(project.studioId, tx), tx);
    const snapshot = buildVariationSnapshot({
      reason: variation.reason,
      from: views.find((v) => v.id === decision.lockedOptionId) ?? null,
      to: views.find((v) => v.id === variation.optionId) ?? null,
      priceDeltaCents: variation.priceDeltaCents ?? 0,
      timeImpactDays: variation.timeImpactDays ?? 0,
    });
    const now = new Date();
    const [approved] = await tx
      .update(variations)
      .set({ status: "approved", decidedBy: actor.userId, decidedAt: now })
      .where(and(eq(variations.id, variation.id), eq(variations.status, "priced"), eq(variations.pricedAt, variation.pricedAt)))
      .returning();
    if (!approved) throw finished(variation);
    const [carried] = await tx
      .update(decisions)
      .set({ lockedOptionId: variation.optionId, version: decision.version + 1 })
      .where(and(eq(decisions.id, decision.id), eq(decisions.version, decision.version), eq(decisions.status, "locked")))
      .returning();
    if (!carried) throw conflict("This decision changed since the variation was priced. Ask your designer to price it again.");
    const [approval] = await tx
      .insert(approvals)
      .values({ decisionId: decision.id, optionId: variation.optionId, userId: actor.userId, variationId: variation.id, snapshot, approvedAt: now })
      .returning();
    await audit(tx, actor, access, "variation.approved", approved, now, {
      option: snapshot.option,
      priceDeltaCents: approved.priceDeltaCents,
      timeImpactDays: approved.timeImpactDays,
    });
    return { ...access, decision: carried, variation: approved, approval };
  });
}

/** The client says no to a variation, or the requester (or studio staff) withdraws it. */
export async function closeVariation(actor: Actor, decisionId: string, variationId: string, outcome: "declined" | "withdrawn") {
  return writeTransaction(async (tx) => {
    const access = await getVariationAccess(actor, decisionId, variationId, tx);
    const { variation } = access;
    const allowed = outcome === "declined" ? access.role === "client" : access.role === "staff" || variation.requestedBy === actor.userId;
    if (!allowed) throw forbidden();
    if (!(OPEN_STATUSES as readonly string[]).includes(variation.status)) throw finished(variation);
    const [closed] = await tx
      .update(variations)
      .set({ status: outcome, decidedBy: actor.userId, decidedAt: new Date() })
      .where(and(eq(variations.id, variation.id), inArray(variations.status, [...OPEN_STATUSES])))
      .returning();
    if (!closed) throw finished(variation);
    await audit(tx, actor, access, `variation.${outcome}`, closed, closed.decidedAt ?? new Date(), {});
    return { ...access, variation: closed };
  });
}
