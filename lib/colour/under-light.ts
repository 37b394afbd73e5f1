import { applyMatrix, computeBradfordMatrix, computeDegreeOfAdaptation } from "./chromatic-adaptation";
import type { Matrix3 } from "./chromatic-adaptation";
import { convertLabToXyz, convertXyzToLab, convertXyzToLinearRgb, D65_WHITE } from "./convert";
import { toHex } from "./to-hex";
import type { Lab } from "./types";
import { computeLampWhite, DAYLIGHT_CCT } from "./white-point";

export { DAYLIGHT_CCT };

export type LightPreset = { readonly id: string; readonly label: string; readonly cct: number };

export const LIGHTS: readonly LightPreset[] = [
  { id: "2700", label: "Warm white 2700 K", cct: 2700 },
  { id: "3000", label: "Warm white 3000 K", cct: 3000 },
  { id: "4000", label: "Cool white 4000 K", cct: 4000 },
  { id: "daylight", label: "Daylight (D65)", cct: DAYLIGHT_CCT },
];

/**
 * The room the preview imagines: about 300 lux (general kitchen lighting), so a white surface
 * has a luminance of E/π ≈ 95 cd/m² and, as CIECAM02 takes it, the eye adapts to 20 % of that.
 */
export const ROOM_ADAPTING_LUMINANCE = 300 / Math.PI / 5;

/** How completely the eye adapts to the lamp in that room: CIECAM02's D, about 0.86. */
export const LAMP_ADAPTATION = computeDegreeOfAdaptation(ROOM_ADAPTING_LUMINANCE);

type LampMatrices = { toLamp: Matrix3; fromLamp: Matrix3; paint: Matrix3 };

// A board recomputes the same few lamps for every swatch, so keep their matrices.
const cache = new Map<number, LampMatrices>();

function scale(m: Matrix3, k: number): Matrix3 {
  return m.map((v) => v * k) as unknown as Matrix3;
}

function getMatrices(cct: number): LampMatrices {
  let m = cache.get(cct);
  if (!m) {
    const lamp = computeLampWhite(cct);
    // The part of the lamp's cast an eye adapted to the lamp (by LAMP_ADAPTATION) still sees,
    // for a screen whose white the viewer is adapted to; scaled so that a white surface (the
    // lamp's white) is the screen's brightest white, so whites stay white and all move together.
    const residual = computeBradfordMatrix(D65_WHITE, lamp, 1 - LAMP_ADAPTATION);
    const peak = Math.max(...convertXyzToLinearRgb(applyMatrix(residual, D65_WHITE)));
    m = { toLamp: computeBradfordMatrix(D65_WHITE, lamp), fromLamp: computeBradfordMatrix(lamp, D65_WHITE), paint: scale(residual, 1 / peak) };
    if (cache.size > 64) cache.clear();
    cache.set(cct, m);
  }
  return m;
}

/**
 * A finish's CIELAB for an observer adapted to the lamp, which is what the checks judge. Its
 * tristimulus under the lamp is estimated from the daylight one by Bradford (Lam 1985), since
 * without the lamp's spectrum nothing better is known; it is then taken relative to the lamp's
 * own white by the same von Kries step in the Bradford cone space and expressed in CIELAB
 * (CIE 15). The two steps undo each other, so this equals the daylight CIELAB to rounding, and
 * no ΔE00, contrast or LRV verdict can change with the lamp. (Dividing by the lamp's white in
 * XYZ, CIELAB's own X/Xn, would not undo Bradford: two near-white paints 2.29 ΔE00 apart in
 * daylight would read 2.62 at 2700 K, a change nothing was measured to show.)
 */
export function underLight(lab: Lab, cctKelvin: number): Lab {
  if (cctKelvin === DAYLIGHT_CCT) return lab;
  const { toLamp, fromLamp } = getMatrices(cctKelvin);
  return convertXyzToLab(applyMatrix(fromLamp, applyMatrix(toLamp, convertLabToXyz(lab))));
}

/**
 * The "#rrggbb" to paint a finish (or the board's neutral surround) under a lamp: as an eye
 * adapted to the lamp sees it, with the residual warmth or coolness CIECAM02's incomplete
 * adaptation leaves, every colour moved by the same linear transform so relations between
 * swatches hold, and anything still outside sRGB brought in by reducing chroma at constant
 * OKLCh lightness and hue (toHex, colorjs.io's CSS Color 4 gamut mapping), never by clipping.
 */
export function paintUnderLight(lab: Lab, cctKelvin: number): string {
  if (cctKelvin === DAYLIGHT_CCT) return toHex(lab);
  return toHex(convertXyzToLab(applyMatrix(getMatrices(cctKelvin).paint, convertLabToXyz(lab))));
}
