import { describe, expect, it } from "vitest";
import { isDueAfterOrderBy, shiftDay, suggestOrderBy } from "@/lib/decisions/order-by";

describe("suggestOrderBy", () => {
  // Rule: order-by = install date minus the longest lead time among the options' finishes.
  // [published: trade process pages, as summarised in DOMAIN.md]
  it("takes the slowest finish of any option", () => {
    const suggestion = suggestOrderBy("2027-04-12", [
      { name: "Saltbush Limestone", leadTimeDays: 21 },
      { name: "Oat Matt Polyurethane", leadTimeDays: 56 },
      { name: "Opal Globe Pendant 300", leadTimeDays: 28 },
    ]);
    // 12 April 2027 minus 56 days: 28 March is −15, 28 February −43, 15 February −56 (2027 is not a leap year).
    expect(suggestion).toEqual({ date: "2027-02-15", leadTimeDays: 56, finishName: "Oat Matt Polyurethane" });
  });

  it("counts across month ends and leap days by the Gregorian calendar", () => {
    // [published: Gregorian rule — 2028 is divisible by 4 and not by 100, so it has 29 February]
    expect(shiftDay("2028-03-01", -1)).toBe("2028-02-29");
    expect(shiftDay("2027-03-01", -1)).toBe("2027-02-28");
    // 2100 is divisible by 100 but not 400: no 29 February.
    expect(shiftDay("2100-03-01", -1)).toBe("2100-02-28");
    expect(shiftDay("2027-01-01", -1)).toBe("2026-12-31");
  });

  it("has nothing to suggest without an install date or finishes", () => {
    expect(suggestOrderBy(null, [{ name: "x", leadTimeDays: 10 }])).toBeNull();
    expect(suggestOrderBy("2027-04-12", [])).toBeNull();
  });

  it("flags a due date later than the order-by date", () => {
    const orderBy = suggestOrderBy("2027-04-12", [{ name: "Stone", leadTimeDays: 21 }]);
    expect(orderBy?.date).toBe("2027-03-22");
    expect(isDueAfterOrderBy("2027-03-23", orderBy)).toBe(true);
    expect(isDueAfterOrderBy("2027-03-22", orderBy)).toBe(false);
    expect(isDueAfterOrderBy("2027-03-23", null)).toBe(false);
  });
});
