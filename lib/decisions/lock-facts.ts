import type { ApprovalView } from "./types";

export type LockFacts = {
  /** The approval that put the carried option on the decision: the first lock, or the variation that replaced it. */
  carrying: ApprovalView | null;
  /** The first approval, when a variation has since replaced what it locked. */
  first: ApprovalView | null;
};

/**
 * Who approved what the decision carries now, and when, read from the approval records (oldest
 * first, as the decision view lists them): the newest approval of the carried option. The first
 * approval is named as well once a variation changed it, so neither approval is credited to the other.
 */
export function readLockFacts(approvals: readonly ApprovalView[], carriedOptionId: string | null): LockFacts {
  const carrying = approvals.findLast((a) => a.optionId === carriedOptionId) ?? approvals[approvals.length - 1] ?? null;
  const first = approvals.find((a) => a.variationId === null) ?? null;
  return { carrying, first: carrying && first && first.id !== carrying.id ? first : null };
}
