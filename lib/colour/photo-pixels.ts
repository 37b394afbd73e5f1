import type { Matrix3 } from "./chromatic-adaptation";
import { convertLinearRgbToXyz, convertXyzToLab, decodeSrgb } from "./convert";

/** Pixels as parallel Lab columns; typed arrays keep 40k pixels cheap to sort and cluster. */
export type LabPixels = { L: Float32Array; a: Float32Array; b: Float32Array; count: number };

/** Rectangle in the same pixel grid as the RGBA buffer it is used with. */
export type PixelRect = { left: number; top: number; right: number; bottom: number };

// Below half coverage a pixel is mostly background, not finish.
const MIN_ALPHA = 128;

const DECODE = Float64Array.from({ length: 256 }, (_, v) => decodeSrgb(v / 255));

/**
 * Opaque pixels with a channel at the end of the scale: `high` at 255 (blown out: the camera
 * recorded "as bright as it goes", not the colour), `low` at 0 and none at 255 (crushed).
 */
export type ClippedCounts = { high: number; low: number };

function countClipped(rgba: Uint8Array, i: number, clipped: ClippedCounts): void {
  const r = rgba[i] ?? 0;
  const g = rgba[i + 1] ?? 0;
  const b = rgba[i + 2] ?? 0;
  if (r === 255 || g === 255 || b === 255) clipped.high++;
  else if (r === 0 || g === 0 || b === 0) clipped.low++;
}

/** Mean linear-light RGB of the opaque pixels of an 8-bit RGBA buffer (null if none), and how many are clipped. */
export function computeMeanLinearRgb(rgba: Uint8Array): { mean: [number, number, number] | null; count: number; clipped: ClippedCounts } {
  let r = 0;
  let g = 0;
  let b = 0;
  let n = 0;
  const clipped = { high: 0, low: 0 };
  for (let i = 0; i + 3 < rgba.length; i += 4) {
    if ((rgba[i + 3] ?? 0) < MIN_ALPHA) continue;
    r += DECODE[rgba[i] ?? 0] ?? 0;
    g += DECODE[rgba[i + 1] ?? 0] ?? 0;
    b += DECODE[rgba[i + 2] ?? 0] ?? 0;
    countClipped(rgba, i, clipped);
    n++;
  }
  return { mean: n === 0 ? null : [r / n, g / n, b / n], count: n, clipped };
}

/**
 * 8-bit sRGB RGBA → Lab (D65) columns, skipping transparent pixels and any inside `skip`
 * (the grey card, which is not the finish). `adapt`, when given, is applied in XYZ first.
 * Clipped pixels are counted (before any correction: clipping happened in the camera).
 */
export function convertPixelsToLab(
  rgba: Uint8Array,
  width: number,
  options: { adapt?: Matrix3; skip?: PixelRect } = {},
): LabPixels & { clipped: ClippedCounts } {
  const total = Math.floor(rgba.length / 4);
  const L = new Float32Array(total);
  const a = new Float32Array(total);
  const b = new Float32Array(total);
  const { adapt: m, skip } = options;
  let count = 0;
  const clipped = { high: 0, low: 0 };
  for (let p = 0; p < total; p++) {
    const i = p * 4;
    if ((rgba[i + 3] ?? 0) < MIN_ALPHA) continue;
    if (skip) {
      const x = p % width;
      const y = (p - x) / width;
      if (x >= skip.left && x < skip.right && y >= skip.top && y < skip.bottom) continue;
    }
    countClipped(rgba, i, clipped);
    let xyz = convertLinearRgbToXyz(DECODE[rgba[i] ?? 0] ?? 0, DECODE[rgba[i + 1] ?? 0] ?? 0, DECODE[rgba[i + 2] ?? 0] ?? 0);
    if (m) {
      xyz = [
        m[0] * xyz[0] + m[1] * xyz[1] + m[2] * xyz[2],
        m[3] * xyz[0] + m[4] * xyz[1] + m[5] * xyz[2],
        m[6] * xyz[0] + m[7] * xyz[1] + m[8] * xyz[2],
      ];
    }
    const lab = convertXyzToLab(xyz);
    L[count] = lab[0];
    a[count] = lab[1];
    b[count] = lab[2];
    count++;
  }
  return { L: L.subarray(0, count), a: a.subarray(0, count), b: b.subarray(0, count), count, clipped };
}
