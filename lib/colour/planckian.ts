import { CIE_1931_2DEG_5NM, CMF_START_NM, CMF_STEP_NM } from "./cie-1931-observer";

/** Second radiation constant, m·K, as CIE 15:2018 uses it for Planckian radiators (ITS-90). */
export const PLANCK_C2 = 1.4388e-2;

/** The colour temperatures the locus below is offered for (the lamps a room may have, and more). */
export const MIN_CCT = 1000;
export const MAX_CCT = 25000;

/**
 * The black-body (Planckian) locus, CIE 1931 xy: Planck's law M(λ, T) ∝ λ⁻⁵ / (exp(c2 / λT) − 1)
 * weighted by the CIE 1931 2° colour-matching functions and summed at 5 nm, the CIE 15 way
 * (the first radiation constant cancels in x and y). 2700 K gives x 0.4599, y 0.4106.
 */
export function computePlanckianXy(cct: number, c2: number = PLANCK_C2): [number, number] {
  if (!(cct >= MIN_CCT && cct <= MAX_CCT)) {
    throw new RangeError(`Colour temperature must be between ${MIN_CCT} K and ${MAX_CCT} K (got ${String(cct)}).`);
  }
  let X = 0;
  let Y = 0;
  let Z = 0;
  for (let i = 0; i + 2 < CIE_1931_2DEG_5NM.length; i += 3) {
    const metres = (CMF_START_NM + (i / 3) * CMF_STEP_NM) * 1e-9;
    const radiance = 1 / (metres ** 5 * Math.expm1(c2 / (metres * cct)));
    X += radiance * (CIE_1931_2DEG_5NM[i] ?? 0);
    Y += radiance * (CIE_1931_2DEG_5NM[i + 1] ?? 0);
    Z += radiance * (CIE_1931_2DEG_5NM[i + 2] ?? 0);
  }
  const sum = X + Y + Z;
  return [X / sum, Y / sum];
}
