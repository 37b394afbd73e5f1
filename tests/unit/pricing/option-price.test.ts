import { describe, expect, it } from "vitest";
import { buildOptionPrice, decimalOf, divideRounded, formatBasisPoints, lineCostCents, taxWords } from "@/lib/pricing/option-price";

const GST = 1000; // 10 %: A New Tax System (Goods and Services Tax) Act 1999 s 9-70 (Australian Taxation Office).

describe("rounding to the cent: half away from zero", () => {
  // Round half away from zero is the usual commercial rounding of money (common practice; the
  // ATO's GST guidance allows rounding to the nearest cent with half a cent rounded up — from memory).
  it.each([
    [5n, 2n, 3n],
    [7n, 2n, 4n],
    [-5n, 2n, -3n],
    [4n, 3n, 1n],
    [5n, 3n, 2n],
  ])("%i / %i → %i", (n, d, q) => expect(divideRounded(n, d)).toBe(q));
});

describe("a line's cost: unit price × quantity, to the cent", () => {
  it("takes the quantity as typed, not as a binary fraction", () => {
    expect(decimalOf(2.4)).toEqual({ digits: 24n, scale: 10n });
    expect(decimalOf(1e-7)).toEqual({ digits: 1n, scale: 10_000_000n });
    // 2.4 × 5 c = 12 c exactly; in floating point 5 × 2.4 is 12.000000000000002.
    expect(lineCostCents({ unitPriceCents: 5, quantity: 2.4 })).toBe(12);
  });
  it("rounds a half cent up (away from zero)", () => {
    // 0.5 × 1 c = 0.5 c → 1 c; 1.5 × 3 c = 4.5 c → 5 c; 0.25 × 2 c = 0.5 c → 1 c.
    expect(lineCostCents({ unitPriceCents: 1, quantity: 0.5 })).toBe(1);
    expect(lineCostCents({ unitPriceCents: 3, quantity: 1.5 })).toBe(5);
    expect(lineCostCents({ unitPriceCents: 2, quantity: 0.25 })).toBe(1);
    expect(lineCostCents({ unitPriceCents: 3, quantity: 0.1 })).toBe(0);
  });
  it("works out the demo benchtop: 6.5 m² at $680.00 = $4,420.00 (invented demo data, hand-checked)", () => {
    expect(lineCostCents({ unitPriceCents: 68000, quantity: 6.5 })).toBe(442000);
  });
});

describe("an option's price: cost × (1 + markup) × (1 + tax)", () => {
  it("with no markup, adds GST of 10 % of the price before tax", () => {
    // s 9-70: GST is 10 % of the value of the taxable supply.
    const p = buildOptionPrice([{ unitPriceCents: 68000, quantity: 6.5 }], { markupBasisPoints: 0, taxBasisPoints: GST });
    expect(p).toEqual({ lineCostsCents: [442000], costCents: 442000, markupCents: 0, taxCents: 44200, totalCents: 486200 });
  });
  it("applies markup on cost before tax (markup on cost is common practice)", () => {
    // $1,000.00 cost, 25 % markup → $1,250.00 before tax, + GST $125.00 = $1,375.00.
    const p = buildOptionPrice([{ unitPriceCents: 50000, quantity: 2 }], { markupBasisPoints: 2500, taxBasisPoints: GST });
    expect(p).toMatchObject({ costCents: 100000, markupCents: 25000, taxCents: 12500, totalCents: 137500 });
  });
  it("rounds each line, sums, then rounds the total once", () => {
    // Lines 3 c × 1.5 = 4.5 → 5 c and 1 c × 0.5 = 0.5 → 1 c: cost 6 c. 6 × 1.125 × 1.1 = 7.425 → 7 c.
    const p = buildOptionPrice([{ unitPriceCents: 3, quantity: 1.5 }, { unitPriceCents: 1, quantity: 0.5 }], { markupBasisPoints: 1250, taxBasisPoints: GST });
    expect(p).toEqual({ lineCostsCents: [5, 1], costCents: 6, markupCents: 1, taxCents: 0, totalCents: 7 });
  });
  it("always adds up: cost + markup + tax = total", () => {
    for (const [price, qty, markup] of [[12345, 3.3, 1750], [999, 7.25, 3333], [42000, 14, 0], [1, 0.3, 9999]] as const) {
      const p = buildOptionPrice([{ unitPriceCents: price, quantity: qty }], { markupBasisPoints: markup, taxBasisPoints: GST });
      expect(p.costCents + p.markupCents + p.taxCents).toBe(p.totalCents);
      // The GST in a GST-inclusive price is 1/11 of it (ATO's "divide by 11" rule, from memory), within a cent.
      expect(Math.abs(p.taxCents - p.totalCents / 11)).toBeLessThanOrEqual(1);
    }
  });
  it("handles large prices without losing cents", () => {
    const p = buildOptionPrice([{ unitPriceCents: 100_000_000_00, quantity: 100_000 }], { markupBasisPoints: 0, taxBasisPoints: GST });
    expect(p.totalCents).toBe(1_100_000_000_000_000);
  });
  it("with no lines, costs nothing", () => {
    expect(buildOptionPrice([], { markupBasisPoints: 2000, taxBasisPoints: GST }).totalCents).toBe(0);
  });
});

describe("the words a client reads beside a price", () => {
  it.each([[1000, "including GST"], [1500, "including tax at 15 %"], [1250, "including tax at 12.5 %"], [0, "no tax added"]])("%i → %s", (bp, words) => expect(taxWords(bp)).toBe(words));
  it("formats basis points", () => expect([1000, 1250, 1225, 33].map(formatBasisPoints)).toEqual(["10 %", "12.5 %", "12.25 %", "0.33 %"]));
});
