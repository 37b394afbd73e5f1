import { describe, expect, it } from "vitest";
import { centsToInput, parseMoneyToCents } from "@/lib/decisions/money-input";

// Money is integer cents (DEVELOPERS.md); these are the ways people write Australian dollars.
describe("parseMoneyToCents", () => {
  it.each([
    ["1234.50", 123450],
    ["$1,234.5", 123450],
    ["980", 98000],
    [" 0.05 ", 5],
    ["12 500", 1250000],
  ])("%s → %i cents", (text, cents) => {
    expect(parseMoneyToCents(text)).toBe(cents);
  });

  it.each(["", "abc", "12.345", "1.2.3", "-5", "1e3"])("refuses %j", (text) => {
    expect(parseMoneyToCents(text)).toBeNull();
  });

  it("takes a minus (or a typographic minus) only where a credit makes sense", () => {
    expect(parseMoneyToCents("-250.00", { allowNegative: true })).toBe(-25000);
    expect(parseMoneyToCents("\u2212250", { allowNegative: true })).toBe(-25000);
  });

  it("round-trips through the form value", () => {
    for (const cents of [0, 5, 123450, -25000]) expect(parseMoneyToCents(centsToInput(cents), { allowNegative: true })).toBe(cents);
  });
});
