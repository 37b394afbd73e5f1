/** mulberry32: tiny deterministic PRNG so random-data tests are repeatable. */
export function createSeededRandom(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (s + 0x6d2b79f5) >>> 0;
    let t = Math.imul(s ^ (s >>> 15), 1 | s);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** A random CIELAB triple over the range real finishes and test data cover. */
export function createRandomLab(random: () => number): [number, number, number] {
  return [random() * 100, random() * 256 - 128, random() * 256 - 128];
}
