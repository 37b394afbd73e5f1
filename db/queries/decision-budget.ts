import { and, desc, eq, getTableColumns, inArray, isNull, sql } from "drizzle-orm";
import { db } from "@/db";
import { approvals, choices, decisions, options, variations } from "@/db/schema";
import { summariseBudget, type BudgetDecision } from "@/lib/decisions/budget";

type Reader = Pick<typeof db, "select">;

/** Latest choice per decision (ties on the millisecond broken by insertion order). */
export async function loadLatestChoices(decisionIds: string[], reader: Reader = db) {
  if (decisionIds.length === 0) return new Map<string, typeof choices.$inferSelect>();
  // One index probe per decision (choice_decision_time_idx), however often a client changed their mind.
  const newest = sql`(select newest.id from ${choices} newest where newest.decision_id = ${decisions.id} order by newest.created_at desc, newest.rowid desc limit 1)`;
  const rows = await reader
    .select(getTableColumns(choices))
    .from(decisions)
    .innerJoin(choices, eq(choices.id, newest))
    .where(inArray(decisions.id, decisionIds));
  return new Map(rows.map((row) => [row.decisionId, row]));
}

/**
 * What each decision of a project adds to the running total: the first approved option plus
 * approved variations (locked), the current pick (chosen), or the allowance (still open).
 */
export async function loadBudgetDecisions(projectId: string, reader: Reader = db) {
  const rows = await reader
    .select({ id: decisions.id, allowanceCents: decisions.allowanceCents, status: decisions.status })
    .from(decisions)
    .where(eq(decisions.projectId, projectId));
  const ids = rows.map((r) => r.id);
  if (ids.length === 0) return new Map<string, BudgetDecision>();
  const [prices, firstApprovals, variationRows, latest] = await Promise.all([
    reader.select({ id: options.id, priceCents: options.priceCents }).from(options).where(inArray(options.decisionId, ids)),
    reader
      .select({ decisionId: approvals.decisionId, optionId: approvals.optionId })
      .from(approvals)
      .where(and(inArray(approvals.decisionId, ids), isNull(approvals.variationId)))
      .orderBy(desc(approvals.approvedAt)),
    reader
      .select({ decisionId: variations.decisionId, delta: variations.priceDeltaCents })
      .from(variations)
      .where(and(inArray(variations.decisionId, ids), eq(variations.status, "approved"))),
    loadLatestChoices(ids, reader),
  ]);
  const priceOf = new Map(prices.map((p) => [p.id, p.priceCents]));
  const approvedOption = new Map(firstApprovals.map((a) => [a.decisionId, a.optionId]));
  const out = new Map<string, BudgetDecision>();
  for (const d of rows) {
    const optionId = d.status === "locked" ? approvedOption.get(d.id) : d.status === "chosen" ? latest.get(d.id)?.optionId : undefined;
    const variationCents = variationRows.filter((v) => v.decisionId === d.id).reduce((sum, v) => sum + (v.delta ?? 0), 0);
    out.set(d.id, { allowanceCents: d.allowanceCents, status: d.status, priceCents: optionId ? (priceOf.get(optionId) ?? null) : null, variationCents });
  }
  return out;
}

export async function getProjectBudget(projectId: string, reader: Reader = db) {
  return summariseBudget([...(await loadBudgetDecisions(projectId, reader)).values()]);
}
