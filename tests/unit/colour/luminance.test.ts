import { describe, expect, it } from "vitest";
import { contrastRatio, lightReflectance, luminanceContrast, parseColour } from "../../../lib/colour";

describe("contrastRatio (WCAG 2.x)", () => {
  // [published: W3C WCAG 2.1, definition of "contrast ratio": (L1 + 0.05) / (L2 + 0.05), range 1 to 21]
  it("gives 21:1 for black on white", () => {
    expect(contrastRatio("#000000", "#ffffff")).toBeCloseTo(21, 6);
  });

  it("gives 1:1 for identical colours [published: W3C WCAG 2.1]", () => {
    expect(contrastRatio("#c8b49a", "#c8b49a")).toBeCloseTo(1, 9);
    expect(contrastRatio([40, 10, 10], [40, 10, 10])).toBeCloseTo(1, 9);
  });

  // [memory: #767676 on white ≈ 4.54:1 is the widely quoted lightest grey meeting WCAG AA 4.5:1]
  it("gives about 4.54 for #767676 on white", () => {
    expect(contrastRatio("#767676", "#ffffff")).toBeCloseTo(4.54, 2);
  });

  it("is the same whichever colour comes first [published: W3C WCAG 2.1, L1 is the lighter]", () => {
    expect(contrastRatio("#336699", "#f4f1ea")).toBe(contrastRatio("#f4f1ea", "#336699"));
    expect(contrastRatio(parseColour("#123456"), "#fedcba")).toBe(contrastRatio("#fedcba", parseColour("#123456")));
  });
});

describe("lightReflectance (LRV)", () => {
  // [published: CIE 15:2004 — sRGB white is the reference white, Y = 100]
  it("is 100 for white and 0 for black", () => {
    expect(Math.abs(lightReflectance("#ffffff") - 100)).toBeLessThan(0.1);
    expect(lightReflectance("#000000")).toBeCloseTo(0, 9);
  });

  // [published: CIE 15:2004 inverse of L*: Y = ((L*+16)/116)³ for L* > 8, else L*/903.3, times 100]
  it.each([0, 2, 5, 8, 8.5, 20, 35, 50, 65, 80, 95, 100])("follows the inverse CIE L* formula at L* = %d", (L) => {
    const expected = L > 8 ? 100 * ((L + 16) / 116) ** 3 : (L / 903.3) * 100;
    // 903.3 is CIE's rounding of 24389/27 = 903.296…, hence 1e-4 rather than exact below L* 8.
    expect(lightReflectance([L, 12, -7])).toBeCloseTo(expected, 4);
  });

  // [memory: mid grey L* 50 reflects about 18.4% — the "18% grey" of photography]
  it("puts L* 50 at about 18.4", () => {
    expect(lightReflectance([50, 0, 0])).toBeCloseTo(18.42, 2);
  });
});

describe("luminanceContrast (Bowman–Sapolinski, as quoted for AS 1428.1)", () => {
  // Worked example as quoted by access consultants: a surface of LRV 20 needs a partner of about
  // 41 or about 7 for 30% [memory: consultants' guidance notes]. Checked here by hand:
  // 125·(41−20)/(41+20+25) = 30.52 and 125·(20−7)/(20+7+25) = 31.25; the exact partners are
  // 40.53 and 7.42, so "about 41 / about 7" are good to within 1 and 1.5 points respectively.
  it("gives about 30% for LRV 20 against 41", () => {
    expect(Math.abs(luminanceContrast(20, 41) - 30)).toBeLessThan(1);
    expect(luminanceContrast(20, 41)).toBeCloseTo(30.523, 3);
  });

  it("gives about 30% for LRV 20 against 7", () => {
    expect(Math.abs(luminanceContrast(20, 7) - 30)).toBeLessThan(1.5);
    expect(luminanceContrast(20, 7)).toBeCloseTo(31.25, 6);
  });

  it("hits exactly 30% at the solved partners 40.53 and 7.42 [derived from the formula]", () => {
    expect(luminanceContrast(20, 3850 / 95)).toBeCloseTo(30, 9);
    expect(luminanceContrast(20, 1150 / 155)).toBeCloseTo(30, 9);
  });

  it("is the same whichever side is lighter, and 0 for equal LRVs [formula as quoted: Y2 is the lighter]", () => {
    expect(luminanceContrast(41, 20)).toBe(luminanceContrast(20, 41));
    expect(luminanceContrast(55, 55)).toBe(0);
  });
});
