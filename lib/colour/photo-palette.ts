import { deltaE2000 } from "./delta-e-2000";
import type { LabPixels } from "./photo-pixels";
import type { Lab } from "./types";

export type PaletteColour = { lab: Lab; share: number };

// Start with more clusters than we report, so a gradient or a veined stone splits finely and
// then merges back by perceived difference rather than by where the seeds happened to fall.
const SEEDS = 8;
const MAX_ROUNDS = 30;
const MAX_COLOURS = 5;
// Clusters nearer than this read as one colour in a photo. [memory: ΔE00 ≈ 5 is "same family at a glance"]
const MERGE_BELOW = 5;
// Smaller areas are flecks, glare or background, not a colour of the finish. [memory]
const MIN_SHARE = 0.03;

type Cluster = { L: number; a: number; b: number; count: number };

/** Small seeded PRNG (mulberry32), so the same photo always gives the same palette. */
function createRandom(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (s + 0x6d2b79f5) >>> 0;
    let t = Math.imul(s ^ (s >>> 15), 1 | s);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function measureSquared(p: LabPixels, i: number, c: Cluster): number {
  const dL = (p.L[i] ?? 0) - c.L;
  const da = (p.a[i] ?? 0) - c.a;
  const db = (p.b[i] ?? 0) - c.b;
  return dL * dL + da * da + db * db;
}

/** k-means++ seeding: each new seed drawn with probability ∝ squared distance to the nearest seed. */
function chooseSeeds(p: LabPixels, random: () => number): Cluster[] {
  const first = Math.floor(random() * p.count);
  const seeds: Cluster[] = [{ L: p.L[first] ?? 0, a: p.a[first] ?? 0, b: p.b[first] ?? 0, count: 0 }];
  const nearest = new Float64Array(p.count).fill(Infinity);
  while (seeds.length < SEEDS) {
    const last = seeds[seeds.length - 1] as Cluster;
    let total = 0;
    for (let i = 0; i < p.count; i++) {
      nearest[i] = Math.min(nearest[i] ?? Infinity, measureSquared(p, i, last));
      total += nearest[i] ?? 0;
    }
    if (total === 0) break; // every pixel already sits on a seed
    let pick = random() * total;
    let chosen = p.count - 1;
    for (let i = 0; i < p.count; i++) {
      pick -= nearest[i] ?? 0;
      if (pick <= 0 && (nearest[i] ?? 0) > 0) {
        chosen = i;
        break;
      }
    }
    seeds.push({ L: p.L[chosen] ?? 0, a: p.a[chosen] ?? 0, b: p.b[chosen] ?? 0, count: 0 });
  }
  return seeds;
}

/** Lloyd's iterations in Lab (Euclidean, ΔE76), which is what the cluster mean minimises. */
function refineClusters(p: LabPixels, seeds: Cluster[]): Cluster[] {
  let clusters = seeds;
  const label = new Int32Array(p.count).fill(-1);
  for (let round = 0; round < MAX_ROUNDS; round++) {
    let moved = 0;
    for (let i = 0; i < p.count; i++) {
      let best = 0;
      let bestD = Infinity;
      for (let k = 0; k < clusters.length; k++) {
        const d = measureSquared(p, i, clusters[k] as Cluster);
        if (d < bestD) {
          bestD = d;
          best = k;
        }
      }
      if (label[i] !== best) moved++;
      label[i] = best;
    }
    if (moved === 0) break; // centres are already the means of these labels
    const sums = clusters.map(() => ({ L: 0, a: 0, b: 0, count: 0 }));
    for (let i = 0; i < p.count; i++) {
      const s = sums[label[i] ?? 0] as Cluster;
      s.L += p.L[i] ?? 0;
      s.a += p.a[i] ?? 0;
      s.b += p.b[i] ?? 0;
      s.count++;
    }
    const next = sums.filter((s) => s.count > 0);
    // Dropping an empty cluster renumbers the rest, so old labels no longer mean anything.
    if (next.length !== sums.length) label.fill(-1);
    clusters = next.map((s) => ({ L: s.L / s.count, a: s.a / s.count, b: s.b / s.count, count: s.count }));
  }
  return clusters;
}

/** Merges the closest pair by ΔE00 while any pair is closer than MERGE_BELOW. */
function mergeClose(clusters: Cluster[]): Cluster[] {
  const list = [...clusters];
  for (;;) {
    let pair: [number, number] | null = null;
    let closest = MERGE_BELOW;
    for (let i = 0; i < list.length; i++) {
      for (let j = i + 1; j < list.length; j++) {
        const x = list[i] as Cluster;
        const y = list[j] as Cluster;
        const d = deltaE2000([x.L, x.a, x.b], [y.L, y.a, y.b]);
        if (d < closest) {
          closest = d;
          pair = [i, j];
        }
      }
    }
    if (!pair) return list;
    const x = list[pair[0]] as Cluster;
    const y = list.splice(pair[1], 1)[0] as Cluster;
    const n = x.count + y.count;
    list[pair[0]] = {
      L: (x.L * x.count + y.L * y.count) / n,
      a: (x.a * x.count + y.a * y.count) / n,
      b: (x.b * x.count + y.b * y.count) / n,
      count: n,
    };
  }
}

/** Up to five dominant colours with their share of the area, largest first; shares sum to 1. */
export function extractPalette(pixels: LabPixels): PaletteColour[] {
  if (pixels.count === 0) return [];
  const clusters = mergeClose(refineClusters(pixels, chooseSeeds(pixels, createRandom(0x6d6f74))));
  const total = clusters.reduce((sum, c) => sum + c.count, 0);
  const kept = clusters
    .filter((c) => c.count / total >= MIN_SHARE)
    .sort((x, y) => y.count - x.count)
    .slice(0, MAX_COLOURS);
  const keptTotal = kept.reduce((sum, c) => sum + c.count, 0);
  return kept.map((c) => ({ lab: [c.L, c.a, c.b] as const, share: c.count / keptTotal }));
}
