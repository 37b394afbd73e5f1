/** Money is integer cents throughout. */

export type AllowanceComparison = { differenceCents: number; direction: "over" | "under" | "on" };

/**
 * Over the allowance the owner pays the difference; under it they are credited.
 * [published: builders' association guidance on prime-cost items, see DOMAIN.md]
 */
export function compareToAllowance(priceCents: number, allowanceCents: number): AllowanceComparison {
  const differenceCents = priceCents - allowanceCents;
  return { differenceCents, direction: differenceCents > 0 ? "over" : differenceCents < 0 ? "under" : "on" };
}

export type BudgetDecision = {
  allowanceCents: number;
  status: "open" | "chosen" | "locked";
  /** Price of the client's current pick (chosen) or of the option first approved (locked). */
  priceCents: number | null;
  /** Sum of approved variations' price differences (including GST) on a locked decision. */
  variationCents?: number;
};

export type BudgetSummary = {
  allowanceCents: number;
  approvedCents: number;
  pickedCents: number;
  /** Decisions still to choose count at their allowance: nothing better is known yet. */
  openAllowanceCents: number;
  runningCents: number;
  differenceCents: number;
  counts: { approved: number; picked: number; open: number };
};

/** The project's running total against its total allowances. */
export function summariseBudget(decisions: readonly BudgetDecision[]): BudgetSummary {
  const out: BudgetSummary = {
    allowanceCents: 0,
    approvedCents: 0,
    pickedCents: 0,
    openAllowanceCents: 0,
    runningCents: 0,
    differenceCents: 0,
    counts: { approved: 0, picked: 0, open: 0 },
  };
  for (const d of decisions) {
    out.allowanceCents += d.allowanceCents;
    if (d.status === "locked" && d.priceCents !== null) {
      out.approvedCents += d.priceCents + (d.variationCents ?? 0);
      out.counts.approved += 1;
    } else if (d.status === "chosen" && d.priceCents !== null) {
      out.pickedCents += d.priceCents;
      out.counts.picked += 1;
    } else {
      out.openAllowanceCents += d.allowanceCents;
      out.counts.open += 1;
    }
  }
  out.runningCents = out.approvedCents + out.pickedCents + out.openAllowanceCents;
  out.differenceCents = out.runningCents - out.allowanceCents;
  return out;
}
