import type { Xyz } from "./types";

// Colour temperature range both approximations below are published for.
export const MIN_CCT = 1667;
export const MAX_CCT = 25000;

/**
 * Planckian (black-body) locus, CIE 1931 xy, by the cubic spline approximation of
 * Kim et al. (2002), "Design of advanced color temperature control system for HDTV
 * applications", J. Korean Physical Society 41(6):865–871. Valid 1667–25000 K.
 */
export function computePlanckianXy(cct: number): [number, number] {
  const t = 1000 / cct;
  const x =
    cct <= 4000
      ? -0.2661239 * t ** 3 - 0.2343589 * t ** 2 + 0.8776956 * t + 0.17991
      : -3.0258469 * t ** 3 + 2.1070379 * t ** 2 + 0.2226347 * t + 0.24039;
  let y: number;
  if (cct <= 2222) y = -1.1063814 * x ** 3 - 1.3481102 * x ** 2 + 2.18555832 * x - 0.20219683;
  else if (cct <= 4000) y = -0.9549476 * x ** 3 - 1.37418593 * x ** 2 + 2.09137015 * x - 0.16748867;
  else y = 3.081758 * x ** 3 - 5.8733867 * x ** 2 + 3.75112997 * x - 0.37001483;
  return [x, y];
}

/**
 * CIE daylight locus, CIE 15:2004 §3.1 (eqs 3.3–3.4): x_D from the correlated colour
 * temperature, y_D = −3.000 x_D² + 2.870 x_D − 0.275. Valid 4000–25000 K; 6504 K gives D65.
 */
export function computeDaylightXy(cct: number): [number, number] {
  const t = 1000 / cct;
  const x =
    cct <= 7000
      ? -4.607 * t ** 3 + 2.9678 * t ** 2 + 0.09911 * t + 0.244063
      : -2.0064 * t ** 3 + 1.9018 * t ** 2 + 0.24748 * t + 0.23704;
  return [x, -3 * x * x + 2.87 * x - 0.275];
}

/**
 * The white of a lamp of this colour temperature, XYZ with Y = 1. Below 4000 K lamps are
 * incandescent-like, so the black-body locus; from 4000 K the daylight locus, which is what
 * "cool white" and daylight lamps aim at.
 */
export function computeLampWhite(cct: number): Xyz {
  if (!(cct >= MIN_CCT && cct <= MAX_CCT)) {
    throw new RangeError(`Colour temperature must be between ${MIN_CCT} K and ${MAX_CCT} K (got ${String(cct)}).`);
  }
  const [x, y] = cct < 4000 ? computePlanckianXy(cct) : computeDaylightXy(cct);
  return [x / y, 1, (1 - x - y) / y];
}
