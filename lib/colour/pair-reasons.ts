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

export function explainAccess(luminanceContrast: number, lrvDifference: number, t: AccessThresholds): Finding {
  const lc = `${Math.round(luminanceContrast)}% luminance contrast`;
  const points = `${Math.round(lrvDifference)} LRV points apart`;
  const lcShort = t.minLuminanceContrast > 0 && luminanceContrast < t.minLuminanceContrast;
  const pointsShort = t.minLrvDifference > 0 && lrvDifference < t.minLrvDifference;
  if (lcShort || pointsShort) {
    const found = [lcShort ? lc : "", pointsShort ? points : ""].filter(Boolean).join(" and ");
    const wanted = [
      lcShort ? `${t.minLuminanceContrast}% (AS 1428.1)` : "",
      pointsShort ? `${t.minLrvDifference} points (BS 8300-2)` : "",
    ]
      .filter(Boolean)
      .join(" and ");
    return {
      verdict: "fail",
      reason: `Too little light–dark difference for people with low vision to tell these apart: ${found}, where ${wanted} is the usual minimum.`,
    };
  }
  const close =
    (t.minLuminanceContrast > 0 && luminanceContrast < t.minLuminanceContrast + t.margin) ||
    (t.minLrvDifference > 0 && lrvDifference < t.minLrvDifference + t.margin);
  if (close) {
    return {
      verdict: "borderline",
      reason: `Only just enough light–dark difference for people with low vision (${lc}, ${points}); confirm with the suppliers' measured LRVs before relying on it.`,
    };
  }
  return {
    verdict: "pass",
    reason: `Enough light–dark difference for people with low vision (${lc}, ${points}).`,
  };
}
