import type { Lab, Xyz } from "./types";

// D65 from its 4-digit chromaticity (0.3127, 0.3290), the same white colorjs.io's lab-d65 uses,
// so our Lab agrees with it to rounding.
export const D65_WHITE: Xyz = [0.3127 / 0.329, 1, (1 - 0.3127 - 0.329) / 0.329];

// CIE 15:2004 defines the L* break point with these exact rationals (ε = (6/29)³, κ = (29/3)³).
const EPSILON = 216 / 24389;
const KAPPA = 24389 / 27;

// sRGB (IEC 61966-2-1) primaries with the D65 white above; same matrices as colorjs.io's srgb-linear.
export const RGB_TO_XYZ = [
  0.41239079926595934, 0.357584339383878, 0.1804807884018343,
  0.21263900587151027, 0.715168678767756, 0.07219231536073371,
  0.01933081871559182, 0.11919477979462598, 0.9505321522496607,
] as const;
export const XYZ_TO_RGB = [
  3.2409699419045226, -1.537383177570094, -0.4986107602930034,
  -0.9692436362808796, 1.8759675015077202, 0.04155505740717559,
  0.05563007969699366, -0.20397695888897652, 1.0569715142428786,
] as const;

/** CIE relative luminance Y (white = 1) from L*, the CIE 15:2004 inverse. */
export function convertLightnessToY(L: number): number {
  return L > 8 ? ((L + 16) / 116) ** 3 : L / KAPPA;
}

function invertF(t: number): number {
  return t > 6 / 29 ? t * t * t : (116 * t - 16) / KAPPA;
}

function applyF(t: number): number {
  return t > EPSILON ? Math.cbrt(t) : (KAPPA * t + 16) / 116;
}

/** Lab (D65) → XYZ (D65). */
export function convertLabToXyz(lab: Lab): Xyz {
  const fy = (lab[0] + 16) / 116;
  return [
    invertF(lab[1] / 500 + fy) * D65_WHITE[0],
    convertLightnessToY(lab[0]),
    invertF(fy - lab[2] / 200) * D65_WHITE[2],
  ];
}

/** XYZ (D65) → Lab (D65). */
export function convertXyzToLab(xyz: Xyz): Lab {
  const fx = applyF(xyz[0] / D65_WHITE[0]);
  const fy = applyF(xyz[1]);
  const fz = applyF(xyz[2] / D65_WHITE[2]);
  return [116 * fy - 16, 500 * (fx - fy), 200 * (fy - fz)];
}

/** Linear-light sRGB (0–1) → XYZ (D65). */
export function convertLinearRgbToXyz(r: number, g: number, b: number): Xyz {
  const m = RGB_TO_XYZ;
  return [m[0] * r + m[1] * g + m[2] * b, m[3] * r + m[4] * g + m[5] * b, m[6] * r + m[7] * g + m[8] * b];
}

/** XYZ (D65) → linear-light sRGB, unclipped. */
export function convertXyzToLinearRgb(xyz: Xyz): [number, number, number] {
  const m = XYZ_TO_RGB;
  const [x, y, z] = xyz;
  return [m[0] * x + m[1] * y + m[2] * z, m[3] * x + m[4] * y + m[5] * z, m[6] * x + m[7] * y + m[8] * z];
}

/** sRGB transfer function, decoding (IEC 61966-2-1). Mirrored so out-of-range values stay monotonic. */
export function decodeSrgb(v: number): number {
  const s = Math.abs(v);
  const lin = s <= 0.04045 ? s / 12.92 : ((s + 0.055) / 1.055) ** 2.4;
  return v < 0 ? -lin : lin;
}

/** sRGB transfer function, encoding. */
export function encodeSrgb(v: number): number {
  const s = Math.abs(v);
  const enc = s <= 0.0031308 ? s * 12.92 : 1.055 * s ** (1 / 2.4) - 0.055;
  return v < 0 ? -enc : enc;
}

/** Gamma-encoded sRGB channels (0–1) → Lab (D65). */
export function convertSrgbToLab(r: number, g: number, b: number): Lab {
  return convertXyzToLab(convertLinearRgbToXyz(decodeSrgb(r), decodeSrgb(g), decodeSrgb(b)));
}
