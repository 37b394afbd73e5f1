import { describe, expect, it } from "vitest";
import { checkPublishedLrv, LRV_DISAGREEMENT_POINTS, parseColour } from "../../../lib/colour";

// LRV = CIE Y × 100 [published: LRV explainers quoting BS 8493; ASTM E1477], and
// Y = ((L* + 16) / 116)³ for L* > 8 [published: CIE 15:2004, the L* definition inverted].
describe("checkPublishedLrv", () => {
  it("flags the demo's Oat finish: published 48 against L* 89.7, which implies about 76", () => {
    const lab = parseColour("#e8e1d3");
    expect(lab[0]).toBeCloseTo(89.7, 1);
    const check = checkPublishedLrv({ lab, lrv: 48, lrvSource: "published", colourSource: "published" });
    expect(check?.impliedLrv).toBeCloseTo(100 * ((lab[0] + 16) / 116) ** 3, 9);
    expect(check?.impliedLrv).toBeCloseTo(75.7, 0);
    expect(check?.disagrees).toBe(true);
    expect(check?.note).toMatch(/^The published LRV 48 is 28 points below the 76 this finish's own colour implies \(CIE Y × 100, L\* 89\.7\)\./);
  });

  // 10 points: [common practice, a house rule; measured LRVs differing by "a few points" is memory]
  it("flags only more than 10 points apart", () => {
    expect(LRV_DISAGREEMENT_POINTS).toBe(10);
    const lab = [50, 0, 0] as const; // Y = (66/116)³ = 0.18419…, LRV 18.4
    const implied = 100 * (66 / 116) ** 3;
    expect(checkPublishedLrv({ lab, lrv: implied + 10, lrvSource: "published", colourSource: "published" })?.disagrees).toBe(false);
    expect(checkPublishedLrv({ lab, lrv: implied - 10, lrvSource: "published", colourSource: "photo" })?.disagrees).toBe(false);
    const over = checkPublishedLrv({ lab, lrv: implied + 10.02, lrvSource: "published", colourSource: "photo" });
    expect(over?.disagrees).toBe(true);
    // 10.02 points is said as 10.02, never as "10", the tolerance itself [rounding rule, lib/colour/figures.ts].
    expect(over?.note).toMatch(/is 10\.02 points above/);
  });

  it("has nothing to compare when the LRV came from the colour or the colour from the LRV", () => {
    const lab = [89.7, 0, 8] as const;
    expect(checkPublishedLrv({ lab, lrv: 48, lrvSource: "computed", colourSource: "published" })).toBeNull();
    expect(checkPublishedLrv({ lab, lrv: 48, lrvSource: "published", colourSource: "computed" })).toBeNull();
  });
});
