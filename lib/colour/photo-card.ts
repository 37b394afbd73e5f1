// Server-only: reads pixels with sharp. Import directly, never via ./index.
import type { Matrix3 } from "./chromatic-adaptation";
import { computeAdaptationMatrix } from "./chromatic-adaptation";
import { convertLinearRgbToXyz, D65_WHITE } from "./convert";
import { checkClipping } from "./photo-clipping";
import { openUpright, PhotoInputError, readPixels } from "./photo-decode";
import { computeMeanLinearRgb } from "./photo-pixels";

/** Pixel rectangle in the photo as it is displayed (after EXIF rotation). */
export type NeutralBox = { left: number; top: number; width: number; height: number };
/** A grey or white card in the shot: where it is, and its known reflectance (CIE Y, 0–1; 0.18 for an 18% grey card). */
export type NeutralCard = { box: NeutralBox; reflectance: number };

// Averaging the card needs far fewer pixels than the card may have.
const CARD_SIZE = 64;
// A card this dark has too little signal to correct from; one this bright is likely clipped.
const CARD_MIN_Y = 0.02;
const CARD_MAX_CHANNEL = 0.98;
// Dividing by a near-empty channel would blow up noise into colour.
const CARD_MIN_CHANNEL = 0.002;

export function checkBox(box: NeutralBox, width: number, height: number): NeutralBox {
  const { left, top, width: w, height: h } = box;
  const whole = [left, top, w, h].every((v) => Number.isInteger(v));
  if (!whole || w <= 0 || h <= 0) {
    throw new PhotoInputError("The grey card box needs a whole-pixel position and a size of at least 1 × 1 pixel.");
  }
  if (left < 0 || top < 0 || left + w > width || top + h > height) {
    throw new PhotoInputError(`The grey card box (${w} × ${h} at ${left}, ${top}) runs outside the ${width} × ${height} photo.`);
  }
  return box;
}

/**
 * The correction that makes the card read as what it is: neutral (a* = b* = 0) *and* at its known
 * reflectance, i.e. white balance and exposure together. One von Kries matrix in the linear sRGB
 * basis takes the card's mean XYZ to D65 scaled to Y = reflectance, so every pixel is scaled by the
 * same per-channel gains a camera's white balance and exposure would have applied. (A photo's cast
 * arises as per-channel gain in the camera; Bradford, built for the eye, leaves 3–7 ΔE00 on
 * saturated colours at 3000 K where channel scaling leaves none.) The LRV then no longer depends on
 * how bright the camera chose to make the picture.
 */
export async function computeCardCorrection(image: Buffer, depth: string, card: NeutralCard): Promise<Matrix3> {
  const { data } = await readPixels(
    openUpright(image, depth)
      .extract(card.box)
      .resize({ width: CARD_SIZE, height: CARD_SIZE, fit: "inside", withoutEnlargement: true }),
  );
  const { mean, count, clipped } = computeMeanLinearRgb(data);
  if (!mean) throw new PhotoInputError("The grey card box is transparent; draw it over the card.");
  checkClipping(clipped, count, "card");
  const seen = convertLinearRgbToXyz(...mean);
  if (seen[1] < CARD_MIN_Y) throw new PhotoInputError("The grey card is too dark in this photo to correct from.");
  if (Math.max(...mean) > CARD_MAX_CHANNEL) {
    throw new PhotoInputError("The grey card is too bright in this photo (it looks washed out); use a greyer card or less exposure.");
  }
  if (Math.min(...mean) < CARD_MIN_CHANNEL) {
    throw new PhotoInputError("The grey card has almost no signal in one colour channel; the light is too coloured to correct from.");
  }
  const y = card.reflectance;
  return computeAdaptationMatrix(seen, [D65_WHITE[0] * y, y, D65_WHITE[2] * y], "srgb");
}
