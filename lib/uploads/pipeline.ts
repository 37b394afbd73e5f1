// Server-only (sharp is native); no "server-only" import so the bench can run it under plain tsx.
import sharp from "sharp";
import type { Sharp, SharpOptions } from "sharp";
import { analysePhoto, PhotoInputError, PhotoNotMeasurableError } from "@/lib/colour/photo";
import type { NeutralCard, PhotoAnalysis } from "@/lib/colour/photo";
import { openUpright } from "@/lib/colour/photo-decode";
import { HttpError } from "@/lib/http";
import { MAX_PIXELS, type ImageKind } from "./limits";

export type ProcessedPhoto = {
  width: number;
  height: number;
  /** The photo re-encoded in its own format: upright, 8-bit sRGB (through its ICC profile), and with no metadata at all. */
  original: Buffer;
  large: Buffer;
  thumb: Buffer;
  /** null when the photo can't be measured (too much of it clipped); `notMeasured` then says why. */
  analysis: PhotoAnalysis | null;
  notMeasured: string | null;
};

export const LARGE_SIZE = 1600;
export const THUMB_SIZE = 400;

// failOn "warning" (sharp's default, kept explicit) turns a truncated or corrupt file into an error.
const input: SharpOptions = { limitInputPixels: MAX_PIXELS, failOn: "warning", autoOrient: true };
// Plain baseline JPEG: trellis, scan and Huffman optimisation cost ~6× the encode time for a few % of size.
const jpegOptions = { quality: 90, mozjpeg: false, trellisQuantisation: false, overshootDeringing: false, optimiseScans: false, optimiseCoding: false } as const;
// WebP effort 2 of 6: half the time of the default for previews nobody inspects byte by byte.
const webpOptions = { quality: 82, effort: 2 } as const;

const UNREADABLE = "We couldn't read that photo: the file may be damaged or cut short. Try exporting it again.";

function encodeOriginal(pipeline: Sharp, kind: ImageKind): Sharp {
  // sharp writes no metadata (EXIF, GPS, XMP, IPTC, ICC) unless asked to; openUpright has made it 8-bit sRGB.
  if (kind === "jpeg") return pipeline.jpeg(jpegOptions);
  if (kind === "png") return pipeline.png({ compressionLevel: 6 });
  if (kind === "webp") return pipeline.webp({ quality: 90, effort: 2 });
  return pipeline.avif({ quality: 70, effort: 2 });
}

function toReadError(error: unknown): HttpError {
  if (error instanceof HttpError) return error;
  if (error instanceof PhotoInputError) return new HttpError(422, error.message);
  if (error instanceof Error && /pixel limit/i.test(error.message)) return tooManyPixels();
  return new HttpError(422, UNREADABLE);
}

const tooManyPixels = () =>
  new HttpError(422, `That photo has more than ${MAX_PIXELS / 1_000_000} megapixels. Export it smaller and try again.`);

/** Reads the header only: refuses too many pixels before a single one is decoded. Answers the bit depth. */
async function checkHeader(bytes: Uint8Array): Promise<string> {
  const meta = await sharp(bytes, input).metadata();
  const pages = meta.pages ?? 1;
  const pageHeight = meta.pageHeight ?? meta.height;
  if (!meta.width || !pageHeight) throw new HttpError(422, UNREADABLE);
  if (meta.width * pageHeight > MAX_PIXELS || meta.width * meta.height > MAX_PIXELS * pages) throw tooManyPixels();
  return meta.depth;
}

/** The analysis, or why there is none: a clipped photo is still kept, just not measured. */
async function measure(png: Buffer): Promise<{ analysis: PhotoAnalysis | null; notMeasured: string | null }> {
  try {
    return { analysis: await analysePhoto(png), notMeasured: null };
  } catch (error) {
    if (error instanceof PhotoNotMeasurableError) return { analysis: null, notMeasured: error.message };
    throw error;
  }
}

/** The previews and the colour analysis share one decode, at preview size, already in sRGB (see openUpright). */
async function makePreviews(bytes: Uint8Array, depth: string) {
  const fit = { fit: "inside", withoutEnlargement: true } as const;
  const mid = await openUpright(bytes, depth, input).resize(LARGE_SIZE, LARGE_SIZE, fit).raw().toBuffer({ resolveWithObject: true });
  const raw = { raw: { width: mid.info.width, height: mid.info.height, channels: mid.info.channels } };
  const large = sharp(mid.data, raw).webp(webpOptions).toBuffer();
  const small = await sharp(mid.data, raw).resize(THUMB_SIZE, THUMB_SIZE, fit).raw().toBuffer({ resolveWithObject: true });
  const smallRaw = { raw: { width: small.info.width, height: small.info.height, channels: small.info.channels } };
  const thumb = sharp(small.data, smallRaw).webp(webpOptions).toBuffer();
  // Lossless, so the analysis sees exactly the downsampled pixels (analysePhoto shrinks to 200 px anyway).
  const analysis = sharp(small.data, smallRaw).png({ compressionLevel: 0 }).toBuffer().then(measure);
  const [largeBuffer, thumbBuffer, measured] = await Promise.all([large, thumb, analysis]);
  return { large: largeBuffer, thumb: thumbBuffer, ...measured };
}

/**
 * The whole upload pipeline on a checked file: header check, then (in parallel) the stripped,
 * upright original and the 1600 px and 400 px WebP previews with the colour analysis.
 * Anything sharp can't read, or too many pixels, is a 422 with a message a designer understands.
 */
export async function processPhoto(bytes: Uint8Array, kind: ImageKind): Promise<ProcessedPhoto> {
  try {
    const depth = await checkHeader(bytes);
    const [original, previews] = await Promise.all([
      encodeOriginal(openUpright(bytes, depth, input), kind).toBuffer({ resolveWithObject: true }),
      makePreviews(bytes, depth),
    ]);
    return { width: original.info.width, height: original.info.height, original: original.data, ...previews };
  } catch (error) {
    throw toReadError(error);
  }
}

/** Colour of a stored photo again, optionally corrected (cast and exposure) by a grey or white card boxed in it. */
export async function remeasurePhoto(original: Buffer, card?: NeutralCard): Promise<PhotoAnalysis> {
  try {
    return await analysePhoto(original, card ? { card } : {});
  } catch (error) {
    throw toReadError(error);
  }
}
