import { assessPair, paintUnderLight, showPairFigures } from "@/lib/colour";
import type { Lab, PairAssessment, PairFigures, PairIntent, Thresholds, Verdict } from "@/lib/colour";
import { DAYLIGHT } from "./lights";
import { orderChecks } from "./order-checks";

export type CheckedItem = { id: string; lab: Lab; lrv: number };
export type CheckedPair = { id: string; itemAId: string; itemBId: string; intent: PairIntent; accessRelevant: boolean };

export type BoardCheck = Omit<PairAssessment, "lrvSource"> & {
  pairId: string;
  itemAId: string;
  itemBId: string;
  intent: PairIntent;
  accessRelevant: boolean;
  /** The figures as shown beside the verdict, rounded so none contradicts it (showPairFigures). */
  figures: PairFigures;
  /**
   * Under a lamp: what the same pair gave in daylight, and whether the verdict differs. Without
   * the lamp's spectrum it cannot (see underLight), so `changed` is false; kept so that a lamp
   * with a measured spectrum can say so when one is added.
   */
  daylight: { verdict: Verdict; deltaE: number; reason: string } | null;
  changed: boolean;
};

/**
 * The one way a board's pairs are judged: each side's colour for an eye adapted to the lamp
 * (CIELAB relative to the lamp's white after a Bradford adaptation, see underLight) and its stored
 * LRV. The stored LRV is the published figure where the maker gives one, otherwise the one computed
 * from the colour; it is a property of the surface measured in daylight. Lacking the lamp's
 * spectrum, the adapted colours are the daylight ones, so every check under a lamp is the
 * daylight check; tests/unit/colour/lamp-verdicts.test.ts holds both to that.
 */
export function computeBoardChecks(
  items: readonly CheckedItem[],
  pairs: readonly CheckedPair[],
  cct: number,
  thresholds: Thresholds,
): BoardCheck[] {
  const byId = new Map(items.map((item) => [item.id, item]));
  const lamp = cct !== DAYLIGHT.cct;
  const checks: BoardCheck[] = [];
  for (const pair of pairs) {
    const a = byId.get(pair.itemAId);
    const b = byId.get(pair.itemBId);
    if (!a || !b) continue; // a pair always has both items; the cascade removes it with either
    // An eye adapted to the lamp sees each finish with its daylight CIELAB (underLight, exact in
    // the maths), so the lamp's check is the daylight one, judged once: recomputing it through
    // the round trip would only add rounding that could tip a figure sitting on a threshold.
    const seen = assessPair({
      a: { lab: a.lab, lrv: a.lrv },
      b: { lab: b.lab, lrv: b.lrv },
      intent: pair.intent,
      accessRelevant: pair.accessRelevant,
      thresholds,
    });
    // Fields listed one by one: a rest-spread copy here made every check a slow dictionary-mode
    // object and the whole board ten times slower to judge (bench/boards.ts).
    checks.push({
      deltaE: seen.deltaE,
      contrastRatio: seen.contrastRatio,
      lrvA: seen.lrvA,
      lrvB: seen.lrvB,
      lrvDifference: seen.lrvDifference,
      luminanceContrast: seen.luminanceContrast,
      verdict: seen.verdict,
      decidedBy: seen.decidedBy,
      reason: seen.reason,
      pairId: pair.id,
      itemAId: pair.itemAId,
      itemBId: pair.itemBId,
      intent: pair.intent,
      accessRelevant: pair.accessRelevant,
      figures: showPairFigures(seen, pair.intent, thresholds),
      daylight: lamp ? { verdict: seen.verdict, deltaE: seen.deltaE, reason: seen.reason } : null,
      changed: false,
    });
  }
  return orderChecks(checks);
}

/** The flat colour of a swatch as an eye adapted to the lamp sees it, for painting the screen. */
export function tintForLight(lab: Lab, cct: number): string {
  return paintUnderLight(lab, cct);
}

export type VerdictCounts = Record<Verdict, number>;

export function countVerdicts(checks: readonly Pick<BoardCheck, "verdict">[]): VerdictCounts {
  const counts: VerdictCounts = { fail: 0, borderline: 0, pass: 0 };
  for (const check of checks) counts[check.verdict] += 1;
  return counts;
}
