import { assessPair, toHex, underLight } from "@/lib/colour";
import type { Lab, PairAssessment, PairIntent, Thresholds, Verdict } from "@/lib/colour";
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
  /** Under a lamp: what the same pair gave in daylight, and whether the verdict differs. */
  daylight: { verdict: Verdict; deltaE: number; reason: string } | null;
  changed: boolean;
};

/**
 * The one way a board's pairs are judged: each side's colour as seen under the lamp (Bradford
 * adaptation from D65, see underLight) and its stored LRV. The stored LRV is the published figure
 * where the maker gives one, otherwise the one computed from the colour; it is a property of the
 * surface measured in daylight, so a lamp changes how the colours read (ΔE00, the verdict for a
 * match or contrast) but not the LRVs or the luminance contrast.
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
    const judge = (labA: Lab, labB: Lab) =>
      assessPair({
        a: { lab: labA, lrv: a.lrv },
        b: { lab: labB, lrv: b.lrv },
        intent: pair.intent,
        accessRelevant: pair.accessRelevant,
        thresholds,
      });
    const inDaylight = judge(a.lab, b.lab);
    const seen = lamp ? judge(underLight(a.lab, cct), underLight(b.lab, cct)) : inDaylight;
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
      daylight: lamp ? { verdict: inDaylight.verdict, deltaE: inDaylight.deltaE, reason: inDaylight.reason } : null,
      changed: lamp && inDaylight.verdict !== seen.verdict,
    });
  }
  return orderChecks(checks);
}

/** The flat colour of a swatch as it would look under the lamp, for painting the screen. */
export function tintForLight(lab: Lab, cct: number): string {
  return toHex(cct === DAYLIGHT.cct ? lab : underLight(lab, cct));
}

export type VerdictCounts = Record<Verdict, number>;

export function countVerdicts(checks: readonly Pick<BoardCheck, "verdict">[]): VerdictCounts {
  const counts: VerdictCounts = { fail: 0, borderline: 0, pass: 0 };
  for (const check of checks) counts[check.verdict] += 1;
  return counts;
}
