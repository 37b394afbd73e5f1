import type { LabPixels } from "./photo-pixels";
import type { Lab } from "./types";

// Highlights, shadows and the darkest veins live in the tails of L*; 5% each side removes
// specular spots and deep veins without eating into the body colour. [memory: common trimming level]
const TRIM = 0.05;

function computeMedian(values: Float32Array): number {
  const sorted = Float32Array.from(values).sort();
  const n = sorted.length;
  if (n === 0) return NaN;
  const mid = n >> 1;
  return n % 2 === 1 ? (sorted[mid] ?? 0) : ((sorted[mid - 1] ?? 0) + (sorted[mid] ?? 0)) / 2;
}

/**
 * One colour for a photo of a finish: drop the lightest and darkest 5% of pixels by L*, then
 * take the median of L*, a* and b* separately. Medians ignore a minority of odd pixels (veins,
 * flecks) that a mean would blend in.
 */
export function computeTrimmedMedian(pixels: LabPixels): Lab {
  const sortedL = Float32Array.from(pixels.L).sort();
  const n = sortedL.length;
  const low = sortedL[Math.floor(n * TRIM)] ?? -Infinity;
  const high = sortedL[Math.min(n - 1, Math.ceil(n * (1 - TRIM)) - 1)] ?? Infinity;
  const keepL: number[] = [];
  const keepA: number[] = [];
  const keepB: number[] = [];
  for (let i = 0; i < pixels.count; i++) {
    const l = pixels.L[i] ?? 0;
    if (l < low || l > high) continue;
    keepL.push(l);
    keepA.push(pixels.a[i] ?? 0);
    keepB.push(pixels.b[i] ?? 0);
  }
  return [
    computeMedian(Float32Array.from(keepL)),
    computeMedian(Float32Array.from(keepA)),
    computeMedian(Float32Array.from(keepB)),
  ];
}
