// Server-only: sharp is a native module. Import this file directly, never via ./index, so
// client bundles stay free of it.
import sharp from "sharp";
import type { OutputInfo, Sharp } from "sharp";
import type { Matrix3 } from "./chromatic-adaptation";
import { computeAdaptationMatrix } from "./chromatic-adaptation";
import { convertLinearRgbToXyz, D65_WHITE } from "./convert";
import { computeMeanLinearRgb, convertPixelsToLab } from "./photo-pixels";
import type { PixelRect } from "./photo-pixels";
import { extractPalette } from "./photo-palette";
import type { PaletteColour } from "./photo-palette";
import { computeTrimmedMedian } from "./photo-statistics";
import type { Lab } from "./types";

export type { PaletteColour } from "./photo-palette";

/** Thrown for a photo or neutral box we can't work with; the message is meant to be shown. */
export class PhotoInputError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "PhotoInputError";
  }
}

/** Pixel rectangle in the photo as it is displayed (after EXIF rotation). */
export type NeutralBox = { left: number; top: number; width: number; height: number };
export type PhotoAnalysis = { representative: Lab; palette: PaletteColour[]; corrected: boolean };

// Plenty for colour statistics, and keeps k-means on ≤ 40k pixels.
const ANALYSIS_SIZE = 200;
// Averaging the card needs far fewer pixels than the card may have.
const CARD_SIZE = 64;
// A card this dark has too little signal to correct from; one this bright is likely clipped.
const CARD_MIN_Y = 0.02;
const CARD_MAX_CHANNEL = 0.98;
// Dividing by a near-empty channel would blow up noise into colour.
const CARD_MIN_CHANNEL = 0.002;

const UNREADABLE = "We couldn't read that file as a photo. Try a JPEG or PNG.";

/** 8-bit sRGB RGBA pixels out of a pipeline; a file that only fails while decoding still gets our message. */
async function readPixels(pipeline: Sharp): Promise<{ data: Buffer; info: OutputInfo }> {
  try {
    return await pipeline.toColourspace("srgb").ensureAlpha().raw({ depth: "uchar" }).toBuffer({ resolveWithObject: true });
  } catch {
    throw new PhotoInputError(UNREADABLE);
  }
}

async function readOrientedSize(image: Buffer): Promise<{ width: number; height: number }> {
  try {
    const meta = await sharp(image).metadata();
    return meta.autoOrient;
  } catch {
    throw new PhotoInputError(UNREADABLE);
  }
}

function checkBox(box: NeutralBox, width: number, height: number): NeutralBox {
  const { left, top, width: w, height: h } = box;
  const whole = [left, top, w, h].every((v) => Number.isInteger(v));
  if (!whole || w <= 0 || h <= 0) {
    throw new PhotoInputError("The grey card box needs a whole-pixel position and a size of at least 1 × 1 pixel.");
  }
  if (left < 0 || top < 0 || left + w > width || top + h > height) {
    throw new PhotoInputError(
      `The grey card box (${w} × ${h} at ${left}, ${top}) runs outside the ${width} × ${height} photo.`,
    );
  }
  return box;
}

/**
 * von Kries matrix (in XYZ) that makes the card's mean colour neutral (a* = b* = 0) at its own
 * lightness. Scaled in the linear sRGB basis, i.e. a white balance: a photo's cast arises as
 * per-channel gain in the camera, and on such a cast Bradford, built for the eye, leaves 3–7 ΔE00
 * on saturated colours at 3000 K where channel scaling leaves none.
 */
async function computeCardCorrection(image: Buffer, box: NeutralBox): Promise<Matrix3> {
  const { data } = await readPixels(
    sharp(image, { autoOrient: true })
      .extract(box)
      .resize({ width: CARD_SIZE, height: CARD_SIZE, fit: "inside", withoutEnlargement: true }),
  );
  const mean = computeMeanLinearRgb(data);
  if (!mean) throw new PhotoInputError("The grey card box is transparent; draw it over the card.");
  const card = convertLinearRgbToXyz(...mean);
  if (card[1] < CARD_MIN_Y) throw new PhotoInputError("The grey card is too dark in this photo to correct from.");
  if (Math.max(...mean) > CARD_MAX_CHANNEL) {
    throw new PhotoInputError("The grey card is too bright in this photo (it looks washed out); use a greyer card or less exposure.");
  }
  if (Math.min(...mean) < CARD_MIN_CHANNEL) {
    throw new PhotoInputError("The grey card has almost no signal in one colour channel; the light is too coloured to correct from.");
  }
  return computeAdaptationMatrix(card, [D65_WHITE[0] * card[1], card[1], D65_WHITE[2] * card[1]], "srgb");
}

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
 * Colour of a finish from a photo: a representative colour that resists glare, shadow and
 * veining, and up to five dominant colours with their area shares. With `neutral` (a grey card
 * in the shot) the lamp's colour cast is removed first and the card itself is left out.
 */
export async function analysePhoto(image: Buffer, options: { neutral?: NeutralBox } = {}): Promise<PhotoAnalysis> {
  const size = await readOrientedSize(image);
  const box = options.neutral ? checkBox(options.neutral, size.width, size.height) : undefined;
  const adapt = box ? await computeCardCorrection(image, box) : undefined;

  const { data, info } = await readPixels(
    sharp(image, { autoOrient: true }).resize({
      width: ANALYSIS_SIZE,
      height: ANALYSIS_SIZE,
      fit: "inside",
      withoutEnlargement: true,
    }),
  );
  const skip = box ? scaleBox(box, size, info) : undefined;
  const pixels = convertPixelsToLab(data, info.width, { adapt, skip });
  if (pixels.count === 0) {
    throw new PhotoInputError(
      box ? "The grey card box covers the whole photo; leave some of the finish showing." : "The photo has no visible pixels.",
    );
  }
  return { representative: computeTrimmedMedian(pixels), palette: extractPalette(pixels), corrected: adapt !== undefined };
}
