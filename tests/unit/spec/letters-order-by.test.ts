import { describe, expect, it } from "vitest";
import { letterForSequence } from "@/lib/spec/letters";
import { orderByDate, shiftDay } from "@/lib/spec/order-by";

describe("revision letters", () => {
  // Bijective base 26, the way spreadsheet columns are named (A…Z, AA, AB…): common practice for
  // drawing and specification revisions past Z, which the trade otherwise rarely reaches.
  it.each([
    [1, "A"],
    [2, "B"],
    [26, "Z"],
    [27, "AA"],
    [28, "AB"],
    [52, "AZ"],
    [53, "BA"],
    [702, "ZZ"],
    [703, "AAA"],
  ])("sequence %i is %s", (sequence, letter) => {
    expect(letterForSequence(sequence)).toBe(letter);
  });

  it("never gives two sequences one letter", () => {
    const letters = new Set(Array.from({ length: 2000 }, (_, i) => letterForSequence(i + 1)));
    expect(letters.size).toBe(2000);
  });

  it("refuses a sequence below 1", () => {
    expect(() => letterForSequence(0)).toThrow(RangeError);
    expect(() => letterForSequence(1.5)).toThrow(RangeError);
  });
});

describe("order-by date = install date minus lead time", () => {
  // The rule is the trade's (DOMAIN.md, "How the work runs": order-by dates follow from install date
  // minus lead time — published trade process pages). The calendar facts are the Gregorian calendar's.
  it("counts back calendar days", () => {
    expect(orderByDate("2027-04-12", 21)).toBe("2027-03-22");
    expect(orderByDate("2027-04-12", 84)).toBe("2027-01-18");
    expect(orderByDate("2027-04-12", 0)).toBe("2027-04-12");
  });

  it("crosses year ends and leap days", () => {
    expect(orderByDate("2027-01-10", 20)).toBe("2026-12-21");
    expect(orderByDate("2028-03-01", 1)).toBe("2028-02-29"); // 2028 is a leap year
    expect(orderByDate("2027-03-01", 1)).toBe("2027-02-28"); // 2027 is not
  });

  it("is unknown without an install date", () => {
    expect(orderByDate(null, 21)).toBeNull();
  });

  it("shifts days in UTC, whatever the server's zone", () => {
    expect(shiftDay("2026-10-04", 1)).toBe("2026-10-05"); // a daylight-saving change day in Sydney
    expect(() => shiftDay("2026-13-01", 1)).toThrow(RangeError);
  });
});
