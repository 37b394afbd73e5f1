import { asc, count, desc, eq, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/sqlite-core";
import { db } from "@/db";
import { approvals, choices, rooms, users, variations } from "@/db/schema";
import { summariseBudget } from "@/lib/decisions/budget";
import type { ApprovalView, ChoiceView, DecisionView, PersonRef, VariationView } from "@/lib/decisions/types";
import { loadBudgetDecisions } from "./decision-budget";
import { loadOptionViews } from "./decision-options";
import { getDecisionAccess, getStudioThresholds, loadOrderBy, specNeedsRevision, type DecisionAccess } from "./decisions";
import { nameOnProject } from "./people-names";
import { getStudioRates } from "./studio-settings";
import type { Actor } from "./users";

type Reader = Pick<typeof db, "select">;

const person = (id: string | null, name: string | null, email: string | null): PersonRef | null =>
  id ? { id, name: name ?? email ?? "Someone" } : null;
const iso = (d: Date | null) => (d ? d.toISOString() : null);

/** The newest picks a decision screen lists; older ones are counted, and stay in the audit log. */
export const CHOICES_SHOWN = 30;

/** Everything a decision screen shows, for the project's staff or its clients. */
export async function getDecisionView(actor: Actor, decisionId: string): Promise<DecisionView> {
  return buildDecisionView(actor, await getDecisionAccess(actor, decisionId));
}

export async function buildDecisionView(actor: Actor, access: DecisionAccess, reader: Reader = db): Promise<DecisionView> {
  const { decision: d, project, role } = access;
  const [thresholds, rates] = await Promise.all([getStudioThresholds(project.studioId, reader), getStudioRates(project.studioId, reader)]);
  const [room] = await reader.select({ name: rooms.name }).from(rooms).where(eq(rooms.id, d.roomId));
  const [optionViews, choiceRows, [choiceCount], approvalRows, variationRows, orderBy, budgetRows, needsRevision] = await Promise.all([
    loadOptionViews(d, thresholds, reader, role === "staff" ? rates : null),
    reader
      .select({ choice: choices, name: nameOnProject(project.id), email: users.email })
      .from(choices)
      .innerJoin(users, eq(users.id, choices.userId))
      .where(eq(choices.decisionId, d.id))
      .orderBy(desc(choices.createdAt), desc(sql`${choices}.rowid`))
      .limit(CHOICES_SHOWN),
    reader.select({ total: count() }).from(choices).where(eq(choices.decisionId, d.id)),
    reader
      .select({ approval: approvals, name: nameOnProject(project.id), email: users.email })
      .from(approvals)
      .innerJoin(users, eq(users.id, approvals.userId))
      .where(eq(approvals.decisionId, d.id))
      .orderBy(asc(approvals.approvedAt)),
    loadVariations(d.id, project.id, reader),
    loadOrderBy([d.id], project.installDate, reader),
    loadBudgetDecisions(project.id, reader),
    role === "staff" ? specNeedsRevision(project.id, d.id, reader) : Promise.resolve(false),
  ]);
  const labelOf = (optionId: string | null) => optionViews.find((o) => o.id === optionId)?.label ?? "an option no longer offered";
  const choiceViews: ChoiceView[] = choiceRows.map(({ choice, name, email }) => ({
    id: choice.id,
    optionId: choice.optionId,
    optionLabel: labelOf(choice.optionId),
    by: person(choice.userId, name, email) ?? { id: choice.userId, name: "Someone" },
    comment: choice.comment,
    at: choice.createdAt.toISOString(),
  }));
  const approvalViews: ApprovalView[] = approvalRows.map(({ approval, name, email }) => ({
    id: approval.id,
    optionId: approval.optionId,
    optionLabel: labelOf(approval.optionId),
    by: person(approval.userId, name, email) ?? { id: approval.userId, name: "Someone" },
    at: approval.approvedAt.toISOString(),
    variationId: approval.variationId,
    snapshot: approval.snapshot,
  }));
  return {
    id: d.id,
    projectId: project.id,
    projectName: project.name,
    installDate: project.installDate,
    roomId: d.roomId,
    roomName: room?.name ?? "",
    title: d.title,
    allowanceCents: d.allowanceCents,
    dueDate: d.dueDate,
    status: d.status,
    version: d.version,
    lockedOptionId: d.lockedOptionId,
    lockedAt: iso(d.lockedAt),
    orderBy: orderBy.get(d.id) ?? null,
    viewer: { id: actor.userId, role },
    options: optionViews,
    taxBasisPoints: rates.taxBasisPoints,
    rates: role === "staff" ? rates : null,
    // Once locked, the pick that matters is the approval; the history stays readable.
    currentChoice: d.status === "locked" ? null : (choiceViews[0] ?? null),
    choices: choiceViews,
    earlierChoiceCount: Math.max(0, (choiceCount?.total ?? 0) - choiceViews.length),
    approvals: approvalViews,
    variations: variationRows.map((v) => ({ ...v, optionLabel: v.optionId ? labelOf(v.optionId) : null })),
    budget: summariseBudget([...budgetRows.values()]),
    specNeedsRevision: needsRevision,
  };
}

async function loadVariations(decisionId: string, projectId: string, reader: Reader): Promise<Omit<VariationView, "optionLabel">[]> {
  const requester = alias(users, "requester");
  const pricer = alias(users, "pricer");
  const decider = alias(users, "decider");
  const rows = await reader
    .select({
      v: variations,
      requester: { name: nameOnProject(projectId, "requester"), email: requester.email },
      pricer: { name: nameOnProject(projectId, "pricer"), email: pricer.email },
      decider: { name: nameOnProject(projectId, "decider"), email: decider.email },
    })
    .from(variations)
    .innerJoin(requester, eq(requester.id, variations.requestedBy))
    .leftJoin(pricer, eq(pricer.id, variations.pricedBy))
    .leftJoin(decider, eq(decider.id, variations.decidedBy))
    .where(eq(variations.decisionId, decisionId))
    .orderBy(desc(variations.createdAt));
  return rows.map(({ v, requester: r, pricer: p, decider: dd }) => ({
    id: v.id,
    status: v.status,
    reason: v.reason,
    requestedBy: person(v.requestedBy, r.name, r.email) ?? { id: v.requestedBy, name: "Someone" },
    requestedAt: v.createdAt.toISOString(),
    optionId: v.optionId,
    priceDeltaCents: v.priceDeltaCents,
    timeImpactDays: v.timeImpactDays,
    pricedBy: person(v.pricedBy, p?.name ?? null, p?.email ?? null),
    pricedAt: v.pricedAt ? v.pricedAt.getTime() : null,
    decidedBy: person(v.decidedBy, dd?.name ?? null, dd?.email ?? null),
    decidedAt: iso(v.decidedAt),
  }));
}
