import { atMost, formatAgainst, formatThreshold } from "./figures";
import { lightReflectance } from "./luminance";
import type { Lab } from "./types";

/**
 * How far a maker's published LRV may sit from the one its own colour implies before the record is
 * flagged. LRV is CIE Y × 100 (measured to BS 8493 / ASTM E1477) and Y follows from L*, so the two
 * describe the same thing; sheen, texture, batch and meter move a real measurement by a few points,
 * never by tens. [common practice: a house rule, not a published tolerance; "a few points" is memory]
 */
export const LRV_DISAGREEMENT_POINTS = 10;

export type LrvCheck = {
  /** CIE Y × 100 of the stored (D65) colour. */
  impliedLrv: number;
  /** Published minus implied, in LRV points. */
  difference: number;
  /** True when they are more than LRV_DISAGREEMENT_POINTS apart. */
  disagrees: boolean;
  /** One plain sentence for the screen and the CSV, or null when they agree. */
  note: string | null;
};

type RecordedFinish = { lab: Lab; lrv: number; lrvSource: string; colourSource: string };

/**
 * A finish's published LRV against the LRV its colour implies. Null when there is nothing to compare:
 * the LRV was computed from the colour, or the colour was built from the LRV.
 */
export function checkPublishedLrv(finish: RecordedFinish): LrvCheck | null {
  if (finish.lrvSource !== "published" || finish.colourSource === "computed") return null;
  const impliedLrv = lightReflectance(finish.lab);
  const difference = finish.lrv - impliedLrv;
  const disagrees = Math.abs(difference) > LRV_DISAGREEMENT_POINTS;
  if (!disagrees) return { impliedLrv, difference, disagrees, note: null };
  const apart = formatAgainst(Math.abs(difference), 0, [atMost(LRV_DISAGREEMENT_POINTS)]);
  const note =
    `The published LRV ${formatThreshold(finish.lrv)} is ${apart} points ${difference < 0 ? "below" : "above"} the ` +
    `${formatAgainst(impliedLrv, 0)} this finish's own colour implies (CIE Y × 100, L* ${formatAgainst(finish.lab[0], 1)}). ` +
    "One of them is probably wrong: check the maker's data sheet and the colour before relying on either for an access check.";
  return { impliedLrv, difference, disagrees, note };
}
