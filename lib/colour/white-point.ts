import { computePlanckianXy } from "./planckian";
import type { Xyz } from "./types";

/** D65's chromaticity to four decimals (CIE 15:2018), the white Mottle's CIELAB is relative to. */
export const D65_XY: readonly [number, number] = [0.3127, 0.329];

/** The CCT that stands for D65 itself (6500 K × 1.4388/1.4380, CIE 15:2004). */
export const DAYLIGHT_CCT = 6504;

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
 * The chromaticity of a light: D65 itself for daylight, otherwise a black body at that colour
 * temperature. Warm and cool white lamps (2700–4000 K) are made to sit near the black-body locus,
 * not the daylight one, so that is the better guess at a lamp we have no spectrum for.
 */
export function computeLightXy(cct: number): [number, number] {
  return cct === DAYLIGHT_CCT ? [D65_XY[0], D65_XY[1]] : computePlanckianXy(cct);
}

/** The same white as XYZ with Y = 1. */
export function computeLampWhite(cct: number): Xyz {
  const [x, y] = computeLightXy(cct);
  return [x / y, 1, (1 - x - y) / y];
}
