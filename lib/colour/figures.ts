/**
 * The one rounding rule for figures shown beside a verdict: a figure never lands on the other side
 * of a threshold from the value it stands for. 29.97 % against a 30 % minimum is "29.97", not
 * "30"; 4.478:1 against WCAG's 4.5:1 is "4.48", not "4.5".
 *
 * A boundary says which side its own value belongs to: `atOrAbove` for "at least t passes"
 * (luminance contrast, LRV points, WCAG ratios, an intended contrast's ΔE00), `atOrBelow` for
 * "up to t passes" (an intended match's ΔE00).
 */
export type Boundary = { at: number; belongs: "atOrAbove" | "atOrBelow" };

/** How many more decimals the rule may add before it rounds toward the value's own side. */
const EXTRA_DECIMALS = 3;

export const atLeast = (at: number): Boundary => ({ at, belongs: "atOrAbove" });
export const atMost = (at: number): Boundary => ({ at, belongs: "atOrBelow" });

function isUpper(x: number, b: Boundary): boolean {
  return b.belongs === "atOrAbove" ? x >= b.at : x > b.at;
}

function firstCrossed(value: number, shown: number, boundaries: readonly Boundary[]): Boundary | undefined {
  for (const b of boundaries) if (isUpper(value, b) !== isUpper(shown, b)) return b;
  return undefined;
}

/**
 * `value` with `digits` decimals (plain ASCII, "." for the point, no grouping), adding decimals one
 * at a time (at most three more) while the rounded figure sits on the other side of any boundary
 * than the value; past that it rounds toward the value's side (down for a value below, up for one
 * above), which can never cross. Figures that no boundary is near keep `digits`.
 */
export function formatAgainst(value: number, digits: number, boundaries: readonly Boundary[] = []): string {
  if (!Number.isFinite(value)) return String(value);
  for (let d = digits; d <= digits + EXTRA_DECIMALS; d++) {
    const text = value.toFixed(d);
    if (!firstCrossed(value, Number(text), boundaries)) return text;
  }
  const d = digits + EXTRA_DECIMALS;
  const scale = 10 ** d;
  const crossed = firstCrossed(value, Number(value.toFixed(d)), boundaries);
  const towardValue = crossed && isUpper(value, crossed) ? Math.ceil(value * scale) : Math.floor(value * scale);
  return (towardValue / scale).toFixed(d);
}

/** A threshold as people write it: 30 → "30", 27.5 → "27.5", 4.5 → "4.5". */
export function formatThreshold(value: number): string {
  return String(Math.round(value * 1000) / 1000);
}
