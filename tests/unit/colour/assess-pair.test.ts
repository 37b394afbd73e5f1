import { describe, expect, it } from "vitest";
import { assessPair, defaultThresholds, mergeThresholds, parseColour } from "../../../lib/colour";
import type { Lab } from "../../../lib/colour";

// Lightness-only pairs centred on L* 50 have S_L = 1, so their ΔE00 is exactly their ΔL*
// [published: CIE 142-2001 / Sharma et al. 2005, S_L = 1 at L̄ = 50]. That lets each case sit
// squarely inside a threshold band.
function makeGreys(deltaE: number): [Lab, Lab] {
  return [
    [50 - deltaE / 2, 0, 0],
    [50 + deltaE / 2, 0, 0],
  ];
}

function assessGreys(deltaE: number, intent: "match" | "contrast") {
  const [a, b] = makeGreys(deltaE);
  return assessPair({ a: { lab: a }, b: { lab: b }, intent, accessRelevant: false });
}

describe("assessPair — intended match", () => {
  // [common practice: ΔE00 ≤ 1 is the commonly quoted just-noticeable difference]
  it("passes an imperceptible difference", () => {
    const r = assessGreys(0.5, "match");
    expect(r.deltaE).toBeCloseTo(0.5, 9);
    expect(r.verdict).toBe("pass");
    expect(r.reason).toMatch(/same colour/);
  });

  // [common practice: between ~1 and ~2 only a careful eye sees it side by side]
  it("calls 1.5 ΔE00 borderline", () => {
    const r = assessGreys(1.5, "match");
    expect(r.verdict).toBe("borderline");
    expect(r.reason).toMatch(/close match/i);
  });

  // [common practice: above ~2 noticeable side by side; memory: up to ~3 it reads as a mistake]
  it("fails a near miss of 2.5 ΔE00 as looking like a mistake", () => {
    const r = assessGreys(2.5, "match");
    expect(r.verdict).toBe("fail");
    expect(r.reason).toMatch(/meant to match.*mistake/);
  });

  it("fails two visibly different whites in plain words [common practice]", () => {
    const r = assessPair({
      a: { lab: parseColour("#f4f1ea") },
      b: { lab: parseColour("#ebe6d8") },
      intent: "match",
      accessRelevant: false,
    });
    expect(r.deltaE).toBeGreaterThan(3);
    expect(r.verdict).toBe("fail");
    expect(r.reason).toBe("These are meant to match but will read as two different whites side by side.");
  });

  it("names greys when greys don't match [common practice]", () => {
    expect(assessGreys(6, "match").reason).toMatch(/two different greys/);
  });
});

describe("assessPair — intended contrast", () => {
  it("fails a contrast that will look like the same colour [common practice: ≤ 2 ΔE00 barely visible]", () => {
    const r = assessGreys(1, "contrast");
    expect(r.verdict).toBe("fail");
    expect(r.reason).toMatch(/meant to contrast.*same colour/);
  });

  // [common practice: ΔE00 ~2–5 on an intended contrast looks like a failed match]
  it("fails a near miss of 3.5 ΔE00", () => {
    const r = assessGreys(3.5, "contrast");
    expect(r.verdict).toBe("fail");
    expect(r.reason).toMatch(/too close.*failed match/);
  });

  it("calls 7 ΔE00 a gentle, borderline contrast [memory: house rule, clear from ~10]", () => {
    const r = assessGreys(7, "contrast");
    expect(r.verdict).toBe("borderline");
    expect(r.reason).toMatch(/gentle contrast/i);
  });

  it("passes a clear contrast [memory: house rule, ≥ 10 ΔE00]", () => {
    const r = assessGreys(12, "contrast");
    expect(r.verdict).toBe("pass");
    expect(r.reason).toMatch(/contrast clearly/);
  });
});

describe("assessPair — access-relevant pairs, by the studio's one standard", () => {
  const grey: Lab = [50, 0, 0];
  const assessLrvs = (lrvA: number, lrvB: number, thresholds?: Parameters<typeof mergeThresholds>[0]) =>
    assessPair({
      a: { lab: grey, lrv: lrvA },
      b: { lab: [80, 0, 0], lrv: lrvB },
      intent: "contrast",
      accessRelevant: true,
      thresholds,
    });

  // [published: AS 1428.1 as quoted by access consultants (DOMAIN.md): C = 125 × (Y2 − Y1) / (Y1 + Y2 + 25), 30 % minimum]
  it("follows AS 1428.1 unless told, naming it with the figure and the minimum", () => {
    const r = assessLrvs(20, 30);
    expect(r.luminanceContrast).toBeCloseTo((125 * 10) / 75, 9);
    expect(r.verdict).toBe("fail");
    expect(r.decidedBy).toBe("access");
    expect(r.reason).toMatch(/^Fails AS 1428\.1: 17 % luminance contrast, 30 % needed\./);
    expect(r.reason).toMatch(/low vision/);
    expect(r.reason).not.toMatch(/BS 8300-2/);
  });

  // [published: BS 8300-2:2018 as quoted, at least 30 LRV points apart]
  it("follows BS 8300-2 when chosen, in LRV points", () => {
    const r = assessLrvs(20, 30, { accessStandard: "bs8300" });
    expect(r.verdict).toBe("fail");
    expect(r.reason).toMatch(/^Fails BS 8300-2: 10 LRV points apart, 30 needed\./);
    expect(r.reason).not.toMatch(/AS 1428\.1/);
  });

  // The AS 1428.1 worked pair 20/41 reaches 30 % [published, as quoted] but is only 21 LRV points apart [published: BS 8300-2 asks for 30].
  it("judges LRV 20 vs 41 differently by standard, and with both names the failing one first", () => {
    const as = assessLrvs(20, 41);
    expect(as.verdict).toBe("borderline");
    expect(as.reason).toMatch(/^Only just passes AS 1428\.1: 31 % luminance contrast, 30 % needed\./);
    expect(as.reason).toMatch(/measured LRVs/);
    const bs = assessLrvs(20, 41, { accessStandard: "bs8300" });
    expect(bs.verdict).toBe("fail");
    expect(bs.reason).toMatch(/^Fails BS 8300-2: 21 LRV points apart, 30 needed\./);
    const both = assessLrvs(20, 41, { accessStandard: "both" });
    expect(both.verdict).toBe("fail");
    expect(both.reason).toMatch(/^Fails BS 8300-2: 21 LRV points apart, 30 needed\. Only just passes AS 1428\.1: 31 % luminance contrast, 30 % needed\./);
  });

  // The demo's case: 45 % passes AS 1428.1's 30 % [published, as quoted] while 25 points misses BS 8300-2's 30 [published, as quoted].
  it("passes 45 % luminance contrast under AS 1428.1 even though the pair is 25 LRV points apart", () => {
    const as = assessLrvs(10, 35);
    expect(as.luminanceContrast).toBeCloseTo((125 * 25) / 70, 9);
    expect(as.verdict).toBe("pass");
    expect(as.reason).toBe("Passes AS 1428.1: 45 % luminance contrast, 30 % needed. Enough light–dark difference for people with low vision.");
    expect(assessLrvs(10, 35, { accessStandard: "both" }).verdict).toBe("fail");
  });

  it("never rounds a shortfall up to the minimum: 29.97 % is said as 29.97 % [rounding rule, lib/colour/figures.ts]", () => {
    const r = assessLrvs(20, 40.5);
    expect(r.luminanceContrast).toBeCloseTo((125 * 20.5) / 85.5, 9);
    expect(r.verdict).toBe("fail");
    expect(r.reason).toMatch(/^Fails AS 1428\.1: 29\.97 % luminance contrast, 30 % needed\./);
  });

  it("calls a pair just over the minimum borderline [memory: LRVs vary a few points by batch and meter]", () => {
    const r = assessLrvs(20, 52, { accessStandard: "bs8300" });
    expect(r.lrvDifference).toBe(32);
    expect(r.verdict).toBe("borderline");
    expect(r.reason).toMatch(/^Only just passes BS 8300-2: 32 LRV points apart, 30 needed\..*measured LRVs/);
  });

  it("says when a studio moved the standard's minimum [project spec]", () => {
    const r = assessLrvs(20, 52, { access: { minLuminanceContrast: 45 } });
    expect(r.verdict).toBe("fail");
    expect(r.reason).toMatch(/^Fails AS 1428\.1: 41 % luminance contrast, 45 % needed \(the studio's figure; the standard as quoted asks for 30 %\)\./);
  });

  it("passes a pair well clear of both minimums under either standard [published: AS 1428.1 as quoted; BS 8300-2]", () => {
    for (const accessStandard of ["as1428", "bs8300", "both"] as const) {
      const r = assessLrvs(15, 80, { accessStandard });
      expect(r.verdict).toBe("pass");
      expect(r.reason).toMatch(/Enough light–dark difference/);
    }
  });

  it("names the standard's result even when the colour finding decides [project rule: every access verdict names its standard]", () => {
    // ΔE00 ≈ 7 between L* 46.5 and 53.5 is a gentle (borderline) contrast [memory: house rule], while LRVs 10 and 80 pass easily.
    const r = assessPair({ a: { lab: [46.5, 0, 0], lrv: 10 }, b: { lab: [53.5, 0, 0], lrv: 80 }, intent: "contrast", accessRelevant: true });
    expect(r.verdict).toBe("borderline");
    expect(r.decidedBy).toBe("contrast");
    expect(r.reason).toMatch(/^A gentle contrast.* Passes AS 1428\.1: \d+ % luminance contrast, 30 % needed\./);
  });

  it("fails an intended match where access needs contrast, for the access reason [project decision: access outranks intent]", () => {
    const r = assessPair({ a: { lab: grey }, b: { lab: grey }, intent: "match", accessRelevant: true });
    expect(r.verdict).toBe("fail");
    expect(r.decidedBy).toBe("access");
  });

  it("refuses an access standard it does not know [project spec: as1428 | bs8300 | both]", () => {
    expect(() => mergeThresholds({ accessStandard: "ada" as never })).toThrow(RangeError);
  });
});

describe("assessPair — numbers and settings", () => {
  // [project rule: a supplier's published LRV wins over one computed from a screen colour]
  it("uses a published LRV over the computed one, and says which it used", () => {
    const r = assessPair({
      a: { lab: parseColour("#ffffff"), lrv: 88 },
      b: { lab: parseColour("#000000") },
      intent: "contrast",
      accessRelevant: true,
    });
    expect(r.lrvA).toBe(88);
    expect(r.lrvSource).toEqual({ a: "published", b: "computed" });
    expect(r.lrvB).toBeCloseTo(0, 9);
    expect(r.lrvDifference).toBe(88);
    expect(r.luminanceContrast).toBeCloseTo((125 * 88) / (88 + 25), 9);
    expect(r.contrastRatio).toBeCloseTo(0.93 / 0.05, 9);
  });

  it("rejects a published LRV outside 0–100 [definition: LRV is a 0–100 scale]", () => {
    expect(() =>
      assessPair({ a: { lab: [50, 0, 0], lrv: 130 }, b: { lab: [50, 0, 0] }, intent: "match", accessRelevant: false }),
    ).toThrow(RangeError);
  });

  it("lets a studio override thresholds [project spec]", () => {
    const [a, b] = makeGreys(2.5);
    const strict = assessPair({ a: { lab: a }, b: { lab: b }, intent: "match", accessRelevant: false });
    const relaxed = assessPair({
      a: { lab: a },
      b: { lab: b },
      intent: "match",
      accessRelevant: false,
      thresholds: { match: { imperceptible: 3, noticeable: 4, nearMiss: 6 } },
    });
    expect(strict.verdict).toBe("fail");
    expect(relaxed.verdict).toBe("pass");
  });

  it("merges overrides without touching the defaults, and refuses nonsense [project spec]", () => {
    const merged = mergeThresholds({ access: { margin: 8 } });
    expect(merged.access.margin).toBe(8);
    expect(merged.access.minLuminanceContrast).toBe(30);
    expect(defaultThresholds.access.margin).toBe(5);
    expect(() => mergeThresholds({ match: { noticeable: -1 } })).toThrow(RangeError);
    expect(() => mergeThresholds({ match: { imperceptible: 5 } })).toThrow(RangeError);
  });
});
