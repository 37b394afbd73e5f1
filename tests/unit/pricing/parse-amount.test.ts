import { describe, expect, it } from "vitest";
import { basisPointsToInput, centsToInput, parseAmount, parseMoney } from "@/lib/pricing/parse-amount";

const cents = (text: string, allowNegative = false) => {
  const r = parseMoney(text, { allowNegative });
  return r.ok ? r.value : r.message;
};

// The written forms are Australian English conventions for money: a full stop before the cents and
// commas between groups of three digits (Australian Government Style Manual, "Numbers and
// measurements" — from memory). Refusing "12,34" is our own rule: it is read as 12.34 in much of
// Europe and as 1,234 by a slip of the finger, so we ask rather than guess.
describe("parseMoney: accepted", () => {
  it.each([
    ["1234", 123400],
    ["1,234.50", 123450],
    ["$1,234.50", 123450],
    ["1234.5", 123450],
    [" 12 ", 1200],
    ["$ 980", 98000],
    ["0", 0],
    ["0.05", 5],
    ["1,234,567.89", 123456789],
    ["12,345", 1234500],
  ])("%j → %i cents", (text, expected) => expect(cents(text)).toBe(expected));
});

describe("parseMoney: refused, with a sentence that says what to do", () => {
  it("refuses the ambiguous 12,34", () => expect(cents("12,34")).toBe("Use a full stop for cents, like 12.34."));
  it("refuses 1,234,5 the same way", () => expect(cents("1,234,5")).toBe("Use a full stop for cents, like 12.34."));
  it("refuses commas out of place", () => expect(cents("12,3456")).toBe("Put commas only between groups of three digits, like 1,234.50."));
  it("refuses more than two decimals", () => expect(cents("1.234")).toBe("Use at most two decimal places (whole cents)."));
  it("refuses a negative unless allowed", () => expect(cents("-250")).toBe("The amount can't be negative."));
  it.each(["", "   ", "abc", "1e3", "12.", ".5", "1 234", "--5", "$"])("refuses %j as not an amount", (text) => {
    expect(typeof cents(text)).toBe("string");
  });
  it("refuses amounts past $100 million", () => expect(cents("100,000,001")).toBe("That amount looks too large."));
});

describe("parseMoney: negatives when allowed (variation credits)", () => {
  it.each([
    ["-250", -25000],
    ["-250.00", -25000],
    ["\u2212250", -25000],
    ["-$1,234.50", -123450],
    ["$-1,234.50", -123450],
    ["-0", 0],
  ])("%j → %i cents", (text, expected) => expect(cents(text, true)).toBe(expected));
});

describe("centsToInput", () => {
  it("round-trips through parseMoney", () => {
    for (const c of [0, 5, 123450, -25000, 100_000_000_00]) expect(cents(centsToInput(c), true)).toBe(c);
  });
});

describe("parseAmount as a percentage (studio settings, in basis points)", () => {
  const bp = (text: string) => {
    const r = parseAmount(text, { kind: "percent" });
    return r.ok ? r.value : r.message;
  };
  // GST is 10 %: A New Tax System (Goods and Services Tax) Act 1999 s 9-70 (Australian Taxation Office).
  it.each([["10", 1000], ["10 %", 1000], ["12.5", 1250], ["12.25%", 1225], ["0", 0]])("%j → %i basis points", (t, e) => expect(bp(t)).toBe(e));
  it("refuses a comma for the decimal", () => expect(bp("12,5")).toBe("Use a full stop for part of a percent, like 12.5."));
  it("refuses three decimals", () => expect(bp("12.125")).toBe("Use at most two decimal places, like 12.25."));
  it("refuses negatives", () => expect(bp("-5")).toBe("The percentage can't be negative."));
  it("writes basis points back as a percentage", () => {
    expect([1000, 1250, 1225, 0, 15000].map(basisPointsToInput)).toEqual(["10", "12.5", "12.25", "0", "150"]);
  });
});
