import { computeLowerBoundSq, computeReach, computeSLMax, SLACK } from "./colour-index-bounds";
import { computeDeltaE2000 } from "./delta-e-2000";
import type { Lab } from "./types";

export type IndexEntry = { id: string; lab: Lab };
export type IndexHit = { id: string; deltaE: number };

export type ColourIndex = {
  readonly size: number;
  /** Every entry with ΔE00(target, entry) ≤ maxDeltaE, ascending by ΔE00, ties by id (code-unit order). */
  within(target: Lab, maxDeltaE: number): IndexHit[];
  /** The k entries nearest by ΔE00, same ordering as within. */
  nearest(target: Lab, k: number): IndexHit[];
};

function compareHits(x: IndexHit, y: IndexHit): number {
  if (x.deltaE !== y.deltaE) return x.deltaE - y.deltaE;
  return x.id < y.id ? -1 : x.id > y.id ? 1 : 0;
}

/** First index whose value is ≥ v (or > v when `after`). */
function search(sorted: Float64Array, v: number, after = false): number {
  let lo = 0;
  let hi = sorted.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    const x = sorted[mid] ?? 0;
    if (x < v || (after && x === v)) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** Keeps `best` sorted and at most `limit` long. */
function insertHit(best: IndexHit[], hit: IndexHit, limit: number): void {
  const last = best[best.length - 1];
  if (best.length === limit && last && compareHits(hit, last) >= 0) return;
  let pos = best.length;
  while (pos > 0 && compareHits(hit, best[pos - 1] as IndexHit) < 0) pos--;
  best.splice(pos, 0, hit);
  if (best.length > limit) best.pop();
}

/**
 * A fixed set of finishes searchable by CIEDE2000. Returns exactly what a brute-force scan with
 * deltaE2000(target, entry) returns, but sorts entries by L* and skips, by proven lower bounds
 * (see colour-index-bounds), those that cannot qualify.
 */
export function createColourIndex(entries: readonly IndexEntry[]): ColourIndex {
  // One NaN would break the L* sort and, with it, every search.
  const bad = entries.find((e) => !e.lab.every((v) => Number.isFinite(v)));
  if (bad) throw new RangeError(`Finish "${bad.id}" has a colour with missing or infinite coordinates.`);
  const order = entries.map((_, i) => i).sort((i, j) => (entries[i]?.lab[0] ?? 0) - (entries[j]?.lab[0] ?? 0));
  const n = order.length;
  const ls = new Float64Array(n);
  const as = new Float64Array(n);
  const bs = new Float64Array(n);
  const cs = new Float64Array(n);
  const ids = order.map((src, i) => {
    const e = entries[src] as IndexEntry;
    [ls[i], as[i], bs[i]] = e.lab;
    cs[i] = Math.hypot(e.lab[1], e.lab[2]);
    return e.id;
  });
  const lMin = ls[0] ?? 0;
  const lMax = ls[n - 1] ?? 0;

  /** ΔE00 to entry i, or Infinity when the bound proves it exceeds `limit`. */
  function measure(t: Lab, tC: number, sLMax: number, i: number, limitSq: number): number {
    const L = ls[i] ?? 0;
    const a = as[i] ?? 0;
    const b = bs[i] ?? 0;
    if (computeLowerBoundSq(t[0], t[1], t[2], tC, L, a, b, cs[i] ?? 0, sLMax) > limitSq) return Infinity;
    return computeDeltaE2000(t[0], t[1], t[2], L, a, b);
  }

  function within(target: Lab, maxDeltaE: number): IndexHit[] {
    if (Number.isNaN(maxDeltaE)) throw new RangeError("maxDeltaE must be a number.");
    if (maxDeltaE < 0 || n === 0) return [];
    const reach = computeReach(target[0], maxDeltaE, lMin, lMax);
    const sLMax = computeSLMax(target[0], lMin, lMax);
    const tC = Math.hypot(target[1], target[2]);
    const limitSq = maxDeltaE * maxDeltaE * SLACK;
    const hits: IndexHit[] = [];
    const end = search(ls, target[0] + reach, true);
    for (let i = search(ls, target[0] - reach); i < end; i++) {
      const deltaE = measure(target, tC, sLMax, i, limitSq);
      if (deltaE <= maxDeltaE) hits.push({ id: ids[i] ?? "", deltaE });
    }
    return hits.sort(compareHits);
  }

  function nearest(target: Lab, k: number): IndexHit[] {
    const want = Math.min(Math.floor(k), n);
    if (!(want > 0)) return [];
    // Walk outwards from the target's lightness keeping the best `want`; stop once the L* bound
    // puts every remaining entry beyond the worst hit kept.
    const sLMax = computeSLMax(target[0], lMin, lMax) * SLACK;
    const tC = Math.hypot(target[1], target[2]);
    const best: IndexHit[] = [];
    let above = search(ls, target[0]);
    let below = above - 1;
    while (below >= 0 || above < n) {
      const gapBelow = below >= 0 ? target[0] - (ls[below] ?? 0) : Infinity;
      const gapAbove = above < n ? (ls[above] ?? 0) - target[0] : Infinity;
      const takeAbove = gapAbove <= gapBelow;
      const worst = best.length === want ? (best[want - 1] as IndexHit).deltaE : Infinity;
      if ((takeAbove ? gapAbove : gapBelow) / sLMax > worst) break;
      const i = takeAbove ? above++ : below--;
      const deltaE = measure(target, tC, sLMax, i, worst * worst * SLACK);
      if (deltaE <= worst) insertHit(best, { id: ids[i] ?? "", deltaE }, want);
    }
    return best;
  }

  return { size: n, within, nearest };
}
