import type { PairAssessment, Verdict } from "@/lib/colour";

const RANK: Record<Verdict, number> = { fail: 0, borderline: 1, pass: 2 };
const DECIDER: Record<PairAssessment["decidedBy"], number> = { access: 0, match: 1, contrast: 2 };

type Orderable = Pick<PairAssessment, "verdict" | "decidedBy" | "deltaE" | "luminanceContrast"> & { pairId: string };

/**
 * How far into trouble a check is, bigger being worse, among checks decided the same way: an
 * access check by how little luminance contrast it has, a match by how far apart the two are,
 * a contrast by how close together.
 */
function measureTrouble(check: Orderable): number {
  if (check.decidedBy === "access") return -check.luminanceContrast;
  if (check.decidedBy === "match") return check.deltaE;
  return -check.deltaE;
}

/**
 * Worst first: fails, then borderlines, then passes; within each, access findings first (they
 * can hurt someone), then matches, then contrasts, each by how far off they are. Ties keep a
 * fixed order by pair id so the list doesn't jump about between renders.
 */
export function orderChecks<T extends Orderable>(checks: readonly T[]): T[] {
  return [...checks].sort(
    (x, y) =>
      RANK[x.verdict] - RANK[y.verdict] ||
      DECIDER[x.decidedBy] - DECIDER[y.decidedBy] ||
      measureTrouble(y) - measureTrouble(x) ||
      (x.pairId < y.pairId ? -1 : x.pairId > y.pairId ? 1 : 0),
  );
}
