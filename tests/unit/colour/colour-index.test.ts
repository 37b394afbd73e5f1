import { describe, expect, it } from "vitest";
import { createColourIndex, deltaE2000 } from "../../../lib/colour";
import type { IndexEntry, IndexHit, Lab } from "../../../lib/colour";
import { computeLowerBoundSq, computeSLMax } from "../../../lib/colour/colour-index-bounds";
import { createRandomLab, createSeededRandom } from "./seeded-random";

// The reference is a brute-force scan with the same ΔE00 and the documented ordering
// (ascending ΔE00, then id by code-unit order). [project spec: results must equal brute force]
function compareHits(x: IndexHit, y: IndexHit): number {
  return x.deltaE - y.deltaE || (x.id < y.id ? -1 : x.id > y.id ? 1 : 0);
}

function scanAll(entries: IndexEntry[], target: Lab): IndexHit[] {
  return entries.map((e) => ({ id: e.id, deltaE: deltaE2000(target, e.lab) })).sort(compareHits);
}

function scanWithin(entries: IndexEntry[], target: Lab, maxDeltaE: number): IndexHit[] {
  return scanAll(entries, target).filter((h) => h.deltaE <= maxDeltaE);
}

/** Random finishes plus exact duplicates under other ids, so ties and ΔE 0 both occur. */
function makeEntries(seed: number, count: number): IndexEntry[] {
  const random = createSeededRandom(seed);
  const entries: IndexEntry[] = [];
  for (let i = 0; i < count; i++) {
    const lab: Lab = random() < 0.6 ? [random() * 100, random() * 40 - 20, random() * 50 - 15] : createRandomLab(random);
    entries.push({ id: `f${String(i).padStart(5, "0")}`, lab });
    if (i % 17 === 0) entries.push({ id: `dup-${i}`, lab: [...lab] });
  }
  // Extremes of L*, where S_L is largest and the pruning bound is loosest.
  entries.push({ id: "black", lab: [0, 0, 0] }, { id: "white", lab: [100, 0, 0] }, { id: "white-2", lab: [100, 0, 0] });
  return entries;
}

describe("createColourIndex", () => {
  const entries = makeEntries(42, 3000);
  const index = createColourIndex(entries);
  const random = createSeededRandom(7);
  const targets: Lab[] = [
    ...Array.from({ length: 150 }, () => createRandomLab(random)),
    ...entries.filter((_, i) => i % 97 === 0).map((e) => e.lab),
    [0, 0, 0],
    [100, 0, 0],
    [-5, 0, 0],
    [105, 3, 3],
  ];

  it("returns exactly what a brute-force scan returns, for many targets and thresholds [project spec]", () => {
    for (const target of targets) {
      const all = scanAll(entries, target);
      for (const max of [0, 0.5, 1, 2, 3, 5, 10, 25, 60]) {
        expect(index.within(target, max)).toEqual(all.filter((h) => h.deltaE <= max));
      }
    }
  }, 20_000);

  it("finds exact duplicates at a threshold of 0, ordered by id", () => {
    const dup = entries.find((e) => e.id === "dup-17");
    const hits = index.within(dup?.lab ?? [0, 0, 0], 0);
    expect(hits.map((h) => h.id)).toEqual(["dup-17", "f00017"]);
    expect(hits.every((h) => h.deltaE === 0)).toBe(true);
    expect(index.within([100, 0, 0], 0).map((h) => h.id)).toEqual(["white", "white-2"]);
  });

  it("returns nothing when nothing is close, for negative thresholds, and for an empty index", () => {
    expect(index.within([50, 127, 127], 0.1)).toEqual(scanWithin(entries, [50, 127, 127], 0.1));
    expect(index.within([50, 0, 0], -1)).toEqual([]);
    expect(createColourIndex([]).within([50, 0, 0], 10)).toEqual([]);
    expect(createColourIndex([]).nearest([50, 0, 0], 3)).toEqual([]);
  });

  it("returns every entry for an infinite threshold", () => {
    expect(index.within([50, 0, 0], Infinity)).toEqual(scanAll(entries, [50, 0, 0]));
  });

  it("nearest(k) equals the brute-force top k, ties included [project spec]", () => {
    for (const target of targets) {
      const all = scanAll(entries, target);
      for (const k of [1, 2, 5, 20, 100]) expect(index.nearest(target, k)).toEqual(all.slice(0, k));
    }
  }, 20_000);

  it("nearest handles k of 0, fractional k and k beyond the size", () => {
    expect(index.nearest([50, 0, 0], 0)).toEqual([]);
    expect(index.nearest([50, 0, 0], 2.7)).toHaveLength(2);
    const small = createColourIndex(entries.slice(0, 5));
    expect(small.nearest([50, 0, 0], 10)).toEqual(scanAll(entries.slice(0, 5), [50, 0, 0]));
  });

  it("breaks ties by id whatever order entries arrive in [project spec]", () => {
    const same: Lab = [60, 5, 5];
    const tied = createColourIndex([
      { id: "c", lab: same },
      { id: "a", lab: same },
      { id: "b", lab: same },
    ]);
    expect(tied.within([61, 5, 5], 5).map((h) => h.id)).toEqual(["a", "b", "c"]);
    expect(tied.nearest([61, 5, 5], 2).map((h) => h.id)).toEqual(["a", "b"]);
  });

  it("rejects entries with coordinates that aren't numbers", () => {
    expect(() => createColourIndex([{ id: "x", lab: [Number.NaN, 0, 0] }])).toThrow(RangeError);
  });
});

describe("colour-index lower bound", () => {
  // The index's exactness rests on this bound never exceeding the true ΔE00 (proof in
  // colour-index-bounds.ts); checked on pairs across the whole Lab range, including the
  // high-chroma blue region where R_T is largest. [published formula: Sharma et al. 2005]
  it("never exceeds ΔE00² on 200,000 random pairs", () => {
    const random = createSeededRandom(99);
    const violations: [Lab, Lab][] = [];
    for (let i = 0; i < 200_000; i++) {
      const x = createRandomLab(random);
      const near = i % 3 === 0;
      const y: Lab = near ? [x[0] + random() * 8 - 4, x[1] + random() * 20 - 10, x[2] + random() * 20 - 10] : createRandomLab(random);
      const cx = Math.hypot(x[1], x[2]);
      const cy = Math.hypot(y[1], y[2]);
      const bound = computeLowerBoundSq(x[0], x[1], x[2], cx, y[0], y[1], y[2], cy, computeSLMax(x[0], y[0], y[0]));
      const exact = deltaE2000(x, y) ** 2;
      if (bound > exact * (1 + 1e-12) + 1e-12) violations.push([x, y]);
    }
    expect(violations).toEqual([]);
  }, 20_000);
});
