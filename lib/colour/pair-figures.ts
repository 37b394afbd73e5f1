import { atLeast, atMost, formatAgainst, type Boundary } from "./figures";
import type { Thresholds } from "./thresholds";

/** The figures shown beside a pair's verdict, as text, each rounded by formatAgainst. */
export type PairFigures = { deltaE: string; contrastRatio: string; lrvDifference: string; luminanceContrast: string };

type Measured = { deltaE: number; contrastRatio: number; lrvDifference: number; luminanceContrast: number };

/**
 * WCAG 2.1's contrast minimums: 3:1 for large text and user-interface parts (SC 1.4.3, 1.4.11),
 * 4.5:1 for text (SC 1.4.3, AA), 7:1 for text at AAA (SC 1.4.6). [published: W3C WCAG 2.1]
 */
const WCAG_RATIOS: readonly Boundary[] = [atLeast(3), atLeast(4.5), atLeast(7)];

/**
 * A pair's figures as the screens show them: ΔE00 to 0.1, the WCAG ratio to 0.1, LRV points and
 * luminance contrast to whole numbers, each with more decimals only where that rounding would put
 * it on the other side of a threshold the verdict used (so 29.97 % never shows as "30").
 */
export function showPairFigures(measured: Measured, intent: "match" | "contrast", t: Thresholds): PairFigures {
  const deltaEBounds =
    intent === "match"
      ? [atMost(t.match.imperceptible), atMost(t.match.noticeable), atMost(t.match.nearMiss)]
      : [atMost(t.match.noticeable), atLeast(t.contrast.nearMiss), atLeast(t.contrast.clear)];
  const { minLuminanceContrast: lc, minLrvDifference: points, margin } = t.access;
  return {
    deltaE: formatAgainst(measured.deltaE, 1, deltaEBounds),
    contrastRatio: formatAgainst(measured.contrastRatio, 1, WCAG_RATIOS),
    lrvDifference: formatAgainst(measured.lrvDifference, 0, [atLeast(points), atLeast(points + margin)]),
    luminanceContrast: formatAgainst(measured.luminanceContrast, 0, [atLeast(lc), atLeast(lc + margin)]),
  };
}
