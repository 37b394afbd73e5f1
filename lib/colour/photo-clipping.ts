import { PhotoNotMeasurableError } from "./photo-decode";
import type { ClippedCounts } from "./photo-pixels";

/**
 * Above this share of clipped pixels a photo is not measured. The trimmed median already drops the
 * lightest and darkest 5% by L* (photo-statistics.ts), so a few specular spots cost nothing; past
 * twice that, clipped pixels sit inside what is measured, and the unclipped ones beside them are on
 * the camera's compressed shoulder or toe, not where its response is near the sRGB curve.
 * [project decision, from the 5% trim; common practice: "no more than a few per cent clipped"]
 */
export const MAX_CLIPPED_SHARE = 0.1;

const percent = (share: number) => `${Math.round(share * 100)}%`;

/** Refuses to measure when more than MAX_CLIPPED_SHARE of `count` pixels are clipped, saying which way and what to do. */
export function checkClipping(clipped: ClippedCounts, count: number, what: "photo" | "card"): void {
  if (count === 0) return;
  const high = clipped.high / count;
  const low = clipped.low / count;
  if (high + low <= MAX_CLIPPED_SHARE) return;
  const blown = high >= low;
  const subject = what === "photo" ? "this photo" : "the card";
  const purpose = what === "photo" ? "measure its colour" : "correct from";
  const share = percent(blown ? high : low);
  const detail = blown
    ? `${share} of ${what === "photo" ? "the finish" : "it"} is at full brightness in at least one colour`
    : `${share} of ${what === "photo" ? "the finish" : "it"} is at black in at least one colour`;
  throw new PhotoNotMeasurableError(
    blown
      ? `Too much of ${subject} is blown out to ${purpose} (${detail}); take it again with less light.`
      : `Too much of ${subject} is crushed to black to ${purpose} (${detail}); take it again with more light.`,
  );
}
