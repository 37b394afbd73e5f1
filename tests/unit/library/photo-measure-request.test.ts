import { describe, expect, it } from "vitest";
import { cardPresets, measureRequestSchema } from "@/lib/uploads/measure-request";
import { estimateLikelyError } from "@/lib/uploads/measured";

const box = { left: 0, top: 0, width: 10, height: 10 };

describe("the re-measure request [project rule: a card's reflectance is said, 2–98%]", () => {
  it.each([2, 18, 40.2, 90, 98])("takes a card of %s%%", (reflectance) => {
    expect(measureRequestSchema.safeParse({ neutral: box, reflectance }).success).toBe(true);
  });

  it.each([0, 1.9, 98.5, 100, "18", null])("refuses a reflectance of %j", (reflectance) => {
    const result = measureRequestSchema.safeParse({ neutral: box, reflectance });
    expect(result.success).toBe(false);
    expect(result.error?.issues[0]?.path).toEqual(["reflectance"]);
  });

  it("asks what the card is when a box comes without one, and for a box when a reflectance comes alone", () => {
    expect(measureRequestSchema.safeParse({ neutral: box }).error?.issues[0]?.message).toMatch(/18% grey card/);
    expect(measureRequestSchema.safeParse({ reflectance: 18 }).error?.issues[0]?.path).toEqual(["neutral"]);
    expect(measureRequestSchema.safeParse({}).success).toBe(true);
  });

  it("offers the 18% grey and 90% white cards [common practice]", () => {
    expect(cardPresets.map((p) => p.reflectance)).toEqual([18, 90]);
  });
});

describe("the likely error shown beside a measurement [common-practice estimates, see lib/uploads/measured.ts]", () => {
  it("is ±10% of the LRV and ΔE00 2 with a card: ±3 at LRV 28", () => {
    expect(estimateLikelyError(28, true)).toEqual({ lrv: 3, deltaE: 2 });
    expect(estimateLikelyError(4, true)).toEqual({ lrv: 1, deltaE: 2 });
  });

  it("is ±30% of the LRV and ΔE00 5 without one: an oak at 28 read 20 and 37 at ±30% exposure", () => {
    expect(estimateLikelyError(28, false)).toEqual({ lrv: 8, deltaE: 5 });
    expect(estimateLikelyError(3, false)).toEqual({ lrv: 2, deltaE: 5 });
  });
});
