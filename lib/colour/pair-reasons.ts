import { atLeast, formatAgainst, formatThreshold } from "./figures";
import { defaultThresholds, type AccessStandard } from "./thresholds";
import type { Lab } from "./types";

export type Verdict = "pass" | "borderline" | "fail";
export type Finding = { verdict: Verdict; reason: string };

const SAME_MATCH = "These will read as the same colour side by side.";
const CLOSE_MATCH =
  "A close match: most people won't see a difference, but a careful eye may spot one side by side in good light.";
const OFF_MATCH =
  "These are meant to match but are slightly off, so side by side it will look like a mistake rather than a choice.";
const SAME_CONTRAST = "These are meant to contrast but will look like the same colour.";
const NEAR_CONTRAST =
  "These are meant to contrast but are too close: they will look like a failed match rather than a deliberate choice.";
const GENTLE_CONTRAST = "A gentle contrast: clear up close, but it may fade from across the room or in low light.";
const CLEAR_CONTRAST = "These contrast clearly.";

/** Plain family word so a failed match can say "two different whites" rather than quote numbers. */
function nameFamily(a: Lab, b: Lab): string {
  const chroma = Math.max(Math.hypot(a[1], a[2]), Math.hypot(b[1], b[2]));
  const lMin = Math.min(a[0], b[0]);
  const lMax = Math.max(a[0], b[0]);
  // Warm and cool whites reach b* ≈ 10, so whites get more chroma room than greys. [memory]
  if (lMin >= 85 && chroma <= 12) return "whites";
  if (chroma <= 8 && lMax < 20) return "blacks";
  if (chroma <= 8) return "greys";
  return "colours";
}

export function explainMatch(a: Lab, b: Lab, deltaE: number, t: { imperceptible: number; noticeable: number; nearMiss: number }): Finding {
  if (deltaE <= t.imperceptible) return { verdict: "pass", reason: SAME_MATCH };
  if (deltaE <= t.noticeable) return { verdict: "borderline", reason: CLOSE_MATCH };
  if (deltaE <= t.nearMiss) return { verdict: "fail", reason: OFF_MATCH };
  return {
    verdict: "fail",
    reason: `These are meant to match but will read as two different ${nameFamily(a, b)} side by side.`,
  };
}

export function explainContrast(deltaE: number, sameBelow: number, t: { nearMiss: number; clear: number }): Finding {
  if (deltaE <= sameBelow) return { verdict: "fail", reason: SAME_CONTRAST };
  if (deltaE < t.nearMiss) return { verdict: "fail", reason: NEAR_CONTRAST };
  if (deltaE < t.clear) return { verdict: "borderline", reason: GENTLE_CONTRAST };
  return { verdict: "pass", reason: CLEAR_CONTRAST };
}

type AccessThresholds = { minLuminanceContrast: number; minLrvDifference: number; margin: number };
type RuleResult = "fails" | "close" | "passes";

const RULE_VERB: Record<RuleResult, string> = { fails: "Fails", close: "Only just passes", passes: "Passes" };
const RESULT_RANK: Record<RuleResult, number> = { passes: 0, close: 1, fails: 2 };

function judgeRule(value: number, min: number, margin: number): RuleResult {
  if (value < min) return "fails";
  return value < min + margin ? "close" : "passes";
}

/** "(the studio's figure; AS 1428.1 as quoted asks for 30 %)" when a studio has moved a standard's minimum. */
function studioFigureNote(min: number, published: number, unit: string): string {
  return min === published ? "" : ` (the studio's figure; the standard as quoted asks for ${formatThreshold(published)}${unit})`;
}

function describeAs1428(lc: number, t: AccessThresholds): { result: RuleResult; text: string } {
  const min = t.minLuminanceContrast;
  const result = judgeRule(lc, min, t.margin);
  const shown = formatAgainst(lc, 0, [atLeast(min), atLeast(min + t.margin)]);
  const note = studioFigureNote(min, defaultThresholds.access.minLuminanceContrast, " %");
  return { result, text: `${RULE_VERB[result]} AS 1428.1: ${shown} % luminance contrast, ${formatThreshold(min)} % needed${note}.` };
}

function describeBs8300(points: number, t: AccessThresholds): { result: RuleResult; text: string } {
  const min = t.minLrvDifference;
  const result = judgeRule(points, min, t.margin);
  const shown = formatAgainst(points, 0, [atLeast(min), atLeast(min + t.margin)]);
  const note = studioFigureNote(min, defaultThresholds.access.minLrvDifference, " points");
  return { result, text: `${RULE_VERB[result]} BS 8300-2: ${shown} LRV ${shown === "1" ? "point" : "points"} apart, ${formatThreshold(min)} needed${note}.` };
}

const ACCESS_SUMMARY: Record<RuleResult, string> = {
  fails: "Too little light–dark difference for people with low vision to tell these apart.",
  close: "Only just enough light–dark difference for people with low vision; confirm with the suppliers' measured LRVs before relying on it.",
  passes: "Enough light–dark difference for people with low vision.",
};
const VERDICT_OF: Record<RuleResult, Verdict> = { fails: "fail", close: "borderline", passes: "pass" };

/**
 * The low-vision check by the one standard the studio follows, named in the words: AS 1428.1's
 * luminance contrast, BS 8300-2's LRV points, or both (the worse of the two decides, the failing
 * rule first). Each figure is rounded so it never reads as meeting a minimum it misses.
 */
export function explainAccess(luminanceContrast: number, lrvDifference: number, t: AccessThresholds, standard: AccessStandard): Finding {
  const as1428 = standard === "bs8300" ? null : describeAs1428(luminanceContrast, t);
  const bs8300 = standard === "as1428" ? null : describeBs8300(lrvDifference, t);
  // With both, the failing (or closer) rule speaks first; a tie keeps AS 1428.1 first.
  const [first, second] = as1428 && bs8300 && RESULT_RANK[bs8300.result] > RESULT_RANK[as1428.result] ? [bs8300, as1428] : [as1428 ?? bs8300, as1428 ? bs8300 : null];
  const worst = first?.result ?? "passes";
  const stated = [first?.text, second?.text].filter(Boolean).join(" ");
  return { verdict: VERDICT_OF[worst], reason: `${stated} ${ACCESS_SUMMARY[worst]}` };
}
