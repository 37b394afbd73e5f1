// Server-only: sharp is a native module. Import this file directly, never via ./index.
import sharp from "sharp";
import type { OutputInfo, Sharp, SharpOptions } from "sharp";

/** Thrown for a photo or neutral box we can't work with; the message is meant to be shown. */
export class PhotoInputError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "PhotoInputError";
  }
}

/**
 * Thrown when the photo itself is fine to keep but its colour can't be measured from it (too much
 * of it is clipped). An upload stores the photo anyway; only the measurement is refused.
 */
export class PhotoNotMeasurableError extends PhotoInputError {
  constructor(message: string) {
    super(message);
    this.name = "PhotoNotMeasurableError";
  }
}

const UNREADABLE = "We couldn't read that file as a photo. Try a JPEG or PNG.";

/**
 * How a photo is opened for anything we measure, show or store: upright, and converted to 8-bit
 * sRGB through its embedded ICC profile.
 *
 * sharp 0.35 converts an 8-bit photo with a profile to sRGB, but one deeper than 8 bits (a 16-bit
 * PNG, say) to Display P3, and its later `toColourspace("srgb")` only changes the bit depth: the
 * P3 numbers came out labelled sRGB (an oak at #b08a5e read #aa8c64, ΔE00 2.5). Setting the
 * pipeline colourspace to sRGB converts such a photo to 8 bits first, so the profile is then
 * applied exactly as for an 8-bit file. Only deep photos get it: on a JPEG it would switch off
 * shrink-on-load, the pipeline's main saving. tests/unit/colour/photo-profiles.test.ts holds this
 * to colorjs.io for 8- and 16-bit files with sRGB, Display P3 and Adobe RGB profiles.
 */
export function openUpright(image: Uint8Array, depth: string | undefined, options: SharpOptions = {}): Sharp {
  const pipeline = sharp(image, { ...options, autoOrient: true });
  return depth === undefined || depth === "uchar" ? pipeline : pipeline.pipelineColourspace("srgb");
}

/** The photo's bit depth and its size as displayed (after EXIF rotation). */
export async function readPhotoHeader(image: Uint8Array): Promise<{ width: number; height: number; depth: string }> {
  try {
    const meta = await sharp(image).metadata();
    return { ...meta.autoOrient, depth: meta.depth };
  } catch {
    throw new PhotoInputError(UNREADABLE);
  }
}

/** 8-bit sRGB RGBA pixels out of a pipeline; a file that only fails while decoding still gets our message. */
export async function readPixels(pipeline: Sharp): Promise<{ data: Buffer; info: OutputInfo }> {
  try {
    return await pipeline.toColourspace("srgb").ensureAlpha().raw({ depth: "uchar" }).toBuffer({ resolveWithObject: true });
  } catch {
    throw new PhotoInputError(UNREADABLE);
  }
}
