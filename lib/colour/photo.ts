// Server-only: sharp is a native module. Import this file directly, never via ./index, so
// client bundles stay free of it.
import { checkBox, computeCardCorrection } from "./photo-card";
import type { NeutralBox, NeutralCard } from "./photo-card";
import { checkClipping } from "./photo-clipping";
import { openUpright, PhotoInputError, readPhotoHeader, readPixels } from "./photo-decode";
import { convertPixelsToLab } from "./photo-pixels";
import type { PixelRect } from "./photo-pixels";
import { extractPalette } from "./photo-palette";
import type { PaletteColour } from "./photo-palette";
import { computeTrimmedMedian } from "./photo-statistics";
import type { Lab } from "./types";

export type { PaletteColour } from "./photo-palette";
export type { NeutralBox, NeutralCard } from "./photo-card";
export { PhotoInputError, PhotoNotMeasurableError } from "./photo-decode";
export { MAX_CLIPPED_SHARE } from "./photo-clipping";

/**
 * `corrected` only when a card was used, which fixed the cast *and* the exposure; `reflectance`
 * is then the card's (0–1).
 */
export type PhotoAnalysis = { representative: Lab; palette: PaletteColour[]; corrected: boolean; reflectance: number | null };

// Plenty for colour statistics, and keeps k-means on ≤ 40k pixels.
const ANALYSIS_SIZE = 200;

/** Where the card lands in the downsampled grid, widened by a pixel for resampling blur. */
function scaleBox(box: NeutralBox, from: { width: number; height: number }, to: { width: number; height: number }): PixelRect {
  const sx = to.width / from.width;
  const sy = to.height / from.height;
  return {
    left: Math.floor(box.left * sx) - 1,
    top: Math.floor(box.top * sy) - 1,
    right: Math.ceil((box.left + box.width) * sx) + 1,
    bottom: Math.ceil((box.top + box.height) * sy) + 1,
  };
}

/**
 * Colour of a finish from a photo, read through its ICC profile at any bit depth: a
 * representative colour that resists glare, shadow and veining, and up to five dominant colours
 * with their area shares. With `card` (a grey or white card in the shot, and its reflectance) the
 * lamp's colour cast and the camera's exposure are removed first and the card itself is left out.
 * Refused (PhotoNotMeasurableError) when too much of the finish or the card is clipped.
 */
export async function analysePhoto(image: Buffer, options: { card?: NeutralCard } = {}): Promise<PhotoAnalysis> {
  const header = await readPhotoHeader(image);
  const card = options.card ? { ...options.card, box: checkBox(options.card.box, header.width, header.height) } : undefined;
  const adapt = card ? await computeCardCorrection(image, header.depth, card) : undefined;

  const { data, info } = await readPixels(
    openUpright(image, header.depth).resize({ width: ANALYSIS_SIZE, height: ANALYSIS_SIZE, fit: "inside", withoutEnlargement: true }),
  );
  const skip = card ? scaleBox(card.box, header, info) : undefined;
  const pixels = convertPixelsToLab(data, info.width, { adapt, skip });
  if (pixels.count === 0) {
    throw new PhotoInputError(card ? "The grey card box covers the whole photo; leave some of the finish showing." : "The photo has no visible pixels.");
  }
  checkClipping(pixels.clipped, pixels.count, "photo");
  return {
    representative: computeTrimmedMedian(pixels),
    palette: extractPalette(pixels),
    corrected: adapt !== undefined,
    reflectance: card ? card.reflectance : null,
  };
}
