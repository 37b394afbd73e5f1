import { RGB_TO_XYZ, XYZ_TO_RGB } from "./convert";
import type { Xyz } from "./types";

/** A 3×3 matrix, row-major. */
export type Matrix3 = readonly [number, number, number, number, number, number, number, number, number];

// Bradford cone response matrix (Lam 1985, as used in CIECAM97s and ICC v4); same values as colorjs.io's CATs.js.
const BRADFORD: Matrix3 = [0.8951, 0.2664, -0.1614, -0.7502, 1.7135, 0.0367, 0.0389, -0.0685, 1.0296];
const BRADFORD_INVERSE: Matrix3 = [
  0.9869929054667121, -0.14705425642099013, 0.15996265166373122, 0.4323052697233945, 0.5183602715367774,
  0.049291228212855594, -0.00852866457517732, 0.04004282165408486, 0.96848669578755,
];

/**
 * Bases for von Kries scaling. "bradford" models how the eye adapts (for lamps);
 * "srgb" scales linear sRGB channels, which is how a camera's colour cast arises and is undone
 * (white balance), so it is the one for photos.
 */
const BASES = {
  bradford: { toSensor: BRADFORD, fromSensor: BRADFORD_INVERSE },
  srgb: { toSensor: XYZ_TO_RGB as unknown as Matrix3, fromSensor: RGB_TO_XYZ as unknown as Matrix3 },
} as const;

export type AdaptationBasis = keyof typeof BASES;

export function applyMatrix(m: Matrix3, v: Xyz): Xyz {
  return [
    m[0] * v[0] + m[1] * v[1] + m[2] * v[2],
    m[3] * v[0] + m[4] * v[1] + m[5] * v[2],
    m[6] * v[0] + m[7] * v[1] + m[8] * v[2],
  ];
}

/**
 * von Kries matrix taking XYZ seen under white `from` to the corresponding XYZ under white `to`:
 * into the basis, scale each channel by to/from, and back. Whites need not have Y = 1, so a
 * measured grey card can be the source white directly. `degree` below 1 takes only that part of
 * the way (each gain D × to/from + 1 − D, as CIECAM02's degree of adaptation blends them).
 */
export function computeAdaptationMatrix(from: Xyz, to: Xyz, basis: AdaptationBasis = "bradford", degree = 1): Matrix3 {
  const { toSensor, fromSensor } = BASES[basis];
  const s = applyMatrix(toSensor, from);
  const d = applyMatrix(toSensor, to);
  const gain = [0, 1, 2].map((k) => degree * ((d[k] ?? 0) / (s[k] ?? 1)) + 1 - degree);
  const out: number[] = [];
  for (let row = 0; row < 3; row++) {
    for (let col = 0; col < 3; col++) {
      let sum = 0;
      for (let k = 0; k < 3; k++) sum += (fromSensor[row * 3 + k] ?? 0) * (gain[k] ?? 0) * (toSensor[k * 3 + col] ?? 0);
      out.push(sum);
    }
  }
  return out as unknown as Matrix3;
}

/** Bradford chromatic adaptation matrix (the usual CAT for corresponding colours). */
export function computeBradfordMatrix(from: Xyz, to: Xyz, degree = 1): Matrix3 {
  return computeAdaptationMatrix(from, to, "bradford", degree);
}

/**
 * How far the eye adapts to a light: CIECAM02's degree of adaptation (CIE 159:2004),
 * D = F × [1 − (1/3.6) × exp((−L_A − 42) / 92)], L_A the adapting luminance in cd/m² and F = 1
 * for an average surround (a lit room).
 */
export function computeDegreeOfAdaptation(adaptingLuminance: number, surroundFactor = 1): number {
  const d = surroundFactor * (1 - (1 / 3.6) * Math.exp((-adaptingLuminance - 42) / 92));
  return Math.min(1, Math.max(0, d));
}
