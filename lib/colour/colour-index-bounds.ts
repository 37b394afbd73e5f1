// Lower bounds on CIEDE2000 that let the index skip entries without ever dropping a true hit.
//
// With l = ΔL'/S_L, c = ΔC'/S_C, h = ΔH'/S_H (Sharma et al. 2005 notation):
//   ΔE00² = l² + c² + h² + R_T·c·h ≥ l² + (1 − |R_T|/2)(c² + h²)        since |c·h| ≤ (c² + h²)/2
//   |R_T| = R_C·|sin 2Δθ| ≤ R_C·sin 60°                                  since 0 < Δθ ≤ 30°
//   c² + h² ≥ (ΔC'² + ΔH'²)/S_C²                                         since S_H ≤ S_C (T < 3)
//   ΔC'² + ΔH'² = g²Δa² + Δb² ≥ Δa² + Δb²                                (the a'b-plane distance; g = 1 + G ≥ 1)
// and S_C, R_C grow with C̄' ≤ 1.5·(C1 + C2)/2, S_L with |L̄ − 50|. Every step only shrinks the
// bound, so "bound > maxΔE" proves "ΔE00 > maxΔE".

const POW25_7 = 6103515625;
const SIN_60 = Math.sqrt(3) / 2;
// Relative slack so rounding in a bound can never drop a hit sitting exactly on the limit.
export const SLACK = 1 + 1e-9;

/** S_L at mean lightness L̄; largest at the ends of the range (≈ 1.747 at L̄ = 0 or 100). */
export function computeSL(lBar: number): number {
  const d = (lBar - 50) * (lBar - 50);
  return 1 + (0.015 * d) / Math.sqrt(20 + d);
}

/** Largest S_L for a target at L against entries with lightness in [lMin, lMax]. */
export function computeSLMax(L: number, lMin: number, lMax: number): number {
  return Math.max(computeSL((L + lMin) / 2), computeSL((L + lMax) / 2));
}

/**
 * Half-width in L* outside which no entry is within maxDeltaE of a target at L. Starts from the
 * S_L bound over the whole data range, then tightens: each pass only considers the L̄ that
 * entries inside the previous (already safe) reach can have.
 */
export function computeReach(L: number, maxDeltaE: number, lMin: number, lMax: number): number {
  let lo = (L + lMin) / 2;
  let hi = (L + lMax) / 2;
  let reach = Infinity;
  for (let pass = 0; pass < 4 && lo <= hi; pass++) {
    reach = maxDeltaE * Math.max(computeSL(lo), computeSL(hi)) * SLACK;
    lo = Math.max(lo, L - reach / 2);
    hi = Math.min(hi, L + reach / 2);
  }
  return reach;
}

/**
 * A value never above ΔE00² between (L1, a1, b1; chroma c1) and (L2, a2, b2; chroma c2), given
 * an upper bound on S_L. Costs one division and one square root.
 */
export function computeLowerBoundSq(
  L1: number, a1: number, b1: number, c1: number,
  L2: number, a2: number, b2: number, c2: number,
  sLMax: number,
): number {
  const l = (L2 - L1) / sLMax;
  const da = a2 - a1;
  const db = b2 - b1;
  const cMax = 0.75 * (c1 + c2);
  const cMax2 = cMax * cMax;
  const cMax7 = cMax2 * cMax2 * cMax2 * cMax;
  const rMax = 2 * SIN_60 * Math.sqrt(cMax7 / (cMax7 + POW25_7));
  const sC = 1 + 0.045 * cMax;
  return l * l + ((1 - rMax / 2) * (da * da + db * db)) / (sC * sC);
}
