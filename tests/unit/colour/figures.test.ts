import { describe, expect, it } from "vitest";
import { atLeast, atMost, defaultThresholds, formatAgainst, formatThreshold, luminanceContrast, mergeThresholds, showPairFigures } from "../../../lib/colour";

// The rule (lib/colour/figures.ts): a figure shown beside a verdict never lands on the other side
// of a threshold from the value it stands for. [project rule: issue "records and checks that tell
// the truth", part 6]
describe("formatAgainst — the one rounding rule", () => {
  it("keeps the usual decimals when no threshold is near", () => {
    expect(formatAgainst(42.4, 0, [atLeast(30)])).toBe("42");
    expect(formatAgainst(2.34, 1, [atMost(2)])).toBe("2.3");
    expect(formatAgainst(7, 0)).toBe("7");
  });

  it("shows a value just below a minimum with enough decimals to stay below it", () => {
    // AS 1428.1's 30 % as quoted [published, DOMAIN.md]
    expect(formatAgainst(29.97, 0, [atLeast(30)])).toBe("29.97");
    expect(formatAgainst(29.94, 0, [atLeast(30)])).toBe("29.9");
    expect(formatAgainst(29.6, 0, [atLeast(30)])).toBe("29.6");
    // WCAG 2.1 SC 1.4.3's 4.5:1 [published: W3C WCAG 2.1]
    expect(formatAgainst(4.478, 1, [atLeast(4.5)])).toBe("4.48");
    expect(formatAgainst(4.4999, 1, [atLeast(4.5)])).toBe("4.4999");
  });

  it("never shows a value below the minimum as equal to or above it, however close", () => {
    const shown = formatAgainst(29.99999999, 0, [atLeast(30)]);
    expect(shown).toBe("29.999");
    expect(Number(shown)).toBeLessThan(30);
  });

  it("lets a value at or just above an at-least minimum round to it (meeting it is passing)", () => {
    expect(formatAgainst(30, 0, [atLeast(30)])).toBe("30");
    expect(formatAgainst(30.004, 0, [atLeast(30)])).toBe("30");
    expect(formatAgainst(4.5, 1, [atLeast(4.5)])).toBe("4.5");
  });

  it("keeps a value just above an at-most limit above it: ΔE00 2.04 on a 2.0 match limit is not '2.0'", () => {
    // [common practice: ΔE00 2 as the noticeable limit for a match, lib/colour/thresholds.ts]
    expect(formatAgainst(2.04, 1, [atMost(2)])).toBe("2.04");
    expect(formatAgainst(2.00001, 1, [atMost(2)])).toBe("2.0001"); // three more decimals at most, then rounded up, away from the limit
    expect(formatAgainst(1.96, 1, [atMost(2)])).toBe("2.0"); // at the limit is inside it
  });

  it("does not show a value above a minimum as below it when the minimum has more decimals", () => {
    expect(formatAgainst(4.541, 1, [atLeast(4.54)])).toBe("4.54");
    expect(formatAgainst(35.2, 0, [atLeast(30), atLeast(35)])).toBe("35");
    expect(formatAgainst(34.6, 0, [atLeast(30), atLeast(35)])).toBe("34.6");
  });

  it("writes thresholds as people do", () => {
    expect(formatThreshold(30)).toBe("30");
    expect(formatThreshold(27.5)).toBe("27.5");
    expect(formatThreshold(4.5)).toBe("4.5");
  });
});

describe("showPairFigures — what the check screens print", () => {
  const t = defaultThresholds;
  it("prints 29.97 %, 29.9 points and 4.48:1 rather than 30 %, 30 points and 4.5:1", () => {
    // LRVs 20 and 40.5: Bowman–Sapolinski as quoted for AS 1428.1 gives 125 × 20.5 / 85.5 = 29.97 %.
    const lc = luminanceContrast(20, 40.5);
    const f = showPairFigures({ deltaE: 12, contrastRatio: 4.478, lrvDifference: 29.94, luminanceContrast: lc }, "contrast", t);
    expect(f).toEqual({ deltaE: "12.0", contrastRatio: "4.48", lrvDifference: "29.9", luminanceContrast: "29.97" });
  });

  it("follows a studio's own thresholds", () => {
    const strict = mergeThresholds({ access: { minLuminanceContrast: 45 } });
    expect(showPairFigures({ deltaE: 1, contrastRatio: 2, lrvDifference: 10, luminanceContrast: 44.8 }, "match", strict).luminanceContrast).toBe("44.8");
    expect(showPairFigures({ deltaE: 1, contrastRatio: 2, lrvDifference: 10, luminanceContrast: 44.8 }, "match", t).luminanceContrast).toBe("45");
  });

  it("rounds ΔE00 against the intent's own limits", () => {
    const base = { contrastRatio: 2, lrvDifference: 10, luminanceContrast: 10 };
    // An intended contrast below 5 ΔE00 is a near miss [memory: house rule]: 4.96 stays under 5.
    expect(showPairFigures({ ...base, deltaE: 4.96 }, "contrast", t).deltaE).toBe("4.96");
    expect(showPairFigures({ ...base, deltaE: 4.96 }, "match", t).deltaE).toBe("5.0");
  });
});
