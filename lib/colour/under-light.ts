import { applyMatrix, computeBradfordMatrix } from "./chromatic-adaptation";
import type { Matrix3 } from "./chromatic-adaptation";
import { convertLabToXyz, convertXyzToLab, D65_WHITE } from "./convert";
import type { Lab } from "./types";
import { computeLampWhite } from "./white-point";

/** The CCT that stands for D65 itself (6500 K × 1.4388/1.4380, CIE 15:2004). */
export const DAYLIGHT_CCT = 6504;

export type LightPreset = { readonly id: string; readonly label: string; readonly cct: number };

export const LIGHTS: readonly LightPreset[] = [
  { id: "2700", label: "Warm white 2700 K", cct: 2700 },
  { id: "3000", label: "Warm white 3000 K", cct: 3000 },
  { id: "4000", label: "Cool white 4000 K", cct: 4000 },
  { id: "daylight", label: "Daylight (D65)", cct: DAYLIGHT_CCT },
];

// A board recomputes the same few lamps for every swatch, so keep their matrices.
const matrixCache = new Map<number, Matrix3>();

function getMatrix(cct: number): Matrix3 {
  let m = matrixCache.get(cct);
  if (!m) {
    m = computeBradfordMatrix(D65_WHITE, computeLampWhite(cct));
    if (matrixCache.size > 64) matrixCache.clear();
    matrixCache.set(cct, m);
  }
  return m;
}

/**
 * How a finish looks under a lamp compared with daylight: Lab (D65) → XYZ → Bradford from D65 to
 * the lamp's white → Lab still relative to D65. So a white paper under 2700 K comes out warm
 * (a*, b* > 0), as the eye sees it against a daylight-lit memory. Models only the lamp's
 * white point, not its spectrum, so it can't show metamerism.
 */
export function underLight(lab: Lab, cctKelvin: number): Lab {
  // D65 against itself is the identity; skip the locus formula's 4th-decimal drift.
  if (cctKelvin === DAYLIGHT_CCT) return lab;
  return convertXyzToLab(applyMatrix(getMatrix(cctKelvin), convertLabToXyz(lab)));
}
