import { describe, expect, it } from "vitest";
import type { Lab } from "@/lib/colour";
import { checkBoardPairs, checkFinishesTogether, NEITHER_MATCH_NOR_CONTRAST, type CheckFinish } from "@/lib/decisions/option-checks";
import sharma from "../../fixtures/ciede2000-sharma-2005.json";

// Pairs from Sharma, Wu & Dalal (2005), Table 1, whose ΔE00 is published to four decimals, so
// each check below sits on a known distance. [published: Sharma et al. 2005]
// The bands (≤1 same, ≤2 close match, 2–5 neither, 5–10 gentle, ≥10 clear) are Mottle's
// defaults in lib/colour/thresholds.ts. [common practice / memory, as noted there]
const pair = (n: number): [CheckFinish, CheckFinish] => {
  const p = sharma.pairs.find((x) => x.pair === n);
  if (!p) throw new Error(`no Sharma pair ${n}`);
  const finish = (id: string, lab: Lab): CheckFinish => ({ id, name: `Finish ${id}`, lab, lrv: 50, lrvSource: "computed" });
  return [finish(`${n}a`, [p.L1, p.a1, p.b1]), finish(`${n}b`, [p.L2, p.a2, p.b2])];
};

describe("checkFinishesTogether (an option without a board)", () => {
  it.each([
    [33, 0.6377, "pass"],
    [25, 1.2644, "borderline"],
    [1, 2.0425, "fail"],
    [16, 4.3065, "fail"],
    [9, 7.1792, "borderline"],
    [17, 27.1492, "pass"],
  ] as const)("Sharma pair %i (ΔE00 %f) is %s", (n, dE, verdict) => {
    const result = checkFinishesTogether(pair(n));
    expect(result.source).toBe("finishes");
    expect(result.checked).toBe(1);
    if (verdict === "pass") {
      expect(result.shown).toEqual([]);
    } else {
      expect(result.shown[0]?.verdict).toBe(verdict);
      expect(result.shown[0]?.deltaE).toBeCloseTo(dE, 4);
    }
  });

  it("calls a pair that is neither a match nor a contrast a likely mistake, in plain words", () => {
    expect(checkFinishesTogether(pair(3)).shown[0]?.reason).toBe(NEITHER_MATCH_NOR_CONTRAST);
  });

  it("has nothing to compare with one finish (or the same finish twice)", () => {
    const [a] = pair(1);
    expect(checkFinishesTogether([a])).toEqual({ source: "none", checked: 0, shown: [] });
    expect(checkFinishesTogether([a, a])).toEqual({ source: "none", checked: 0, shown: [] });
  });
});

describe("checkBoardPairs (an option shown on a sample board)", () => {
  it("judges each pair against its intent and shows the worst first, at most three", () => {
    const [sameA, sameB] = pair(33);
    const [nearA, nearB] = pair(1);
    const [gentleA, gentleB] = pair(9);
    const [clearA, clearB] = pair(17);
    const result = checkBoardPairs([
      { aLabel: "Tall cabinets", bLabel: "Base cabinets", a: sameA, b: sameB, intent: "match", accessRelevant: false },
      { aLabel: "Benchtop", bLabel: "Base cabinets", a: gentleA, b: gentleB, intent: "contrast", accessRelevant: false },
      { aLabel: "Splashback", bLabel: "Benchtop", a: nearA, b: nearB, intent: "contrast", accessRelevant: false },
      { aLabel: "Floor", bLabel: "Kickboard", a: clearA, b: clearB, intent: "contrast", accessRelevant: false },
      { aLabel: "Island", bLabel: "Floor", a: sameA, b: sameB, intent: "contrast", accessRelevant: false },
    ]);
    expect(result.checked).toBe(5);
    expect(result.shown.map((c) => [c.between, c.verdict])).toEqual([
      ["Island and Floor", "fail"],
      ["Splashback and Benchtop", "fail"],
      ["Benchtop and Base cabinets", "borderline"],
    ]);
    expect(result.shown[1]?.reason).toMatch(/meant to contrast but are too close/);
  });
});
