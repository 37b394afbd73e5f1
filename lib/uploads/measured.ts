import { lightReflectance, toHex } from "@/lib/colour";
import type { Lab } from "@/lib/colour";
import { roundLab, roundLrv } from "@/lib/validation/finish-colour";

export type MeasuredColour = { hex: string; lab: [number, number, number]; lrv: number };
export type PaletteEntry = { hex: string; lab: [number, number, number]; share: number };
/** How far the measurement is likely to be from the physical sample: ± LRV points, and ΔE00. */
export type LikelyError = { lrv: number; deltaE: number };
/**
 * What the upload and re-measure routes answer about a photo's colour. `corrected` only when a
 * card fixed the cast and exposure; `cardReflectance` is then its reflectance in per cent.
 */
export type Measurement = {
  colour: MeasuredColour;
  palette: PaletteEntry[];
  corrected: boolean;
  cardReflectance: number | null;
  likelyError: LikelyError;
};

type Analysis = { representative: Lab; palette: { lab: Lab; share: number }[]; corrected: boolean; reflectance: number | null };

/*
 * The likely error, stated on screen. Estimates, not measured on real cameras:
 * - LRV is CIE Y, and Y scales with the light on the sample. With a card, what is left is the
 *   difference in light between the card and the sample and the card's own tolerance: about 10%
 *   of Y together [common-practice estimate: card beside the sample, same plane, even light],
 *   so ±10% of the LRV (±3 at LRV 28), at least ±1.
 * - Without a card the camera chose the exposure. ±30% exposure (how far an auto-exposure is
 *   easily off on a light or dark finish [common-practice estimate]) moves an LRV of 28 to 20 or
 *   37, so ±30% of the LRV, at least ±2.
 * - Colour: with a card, the camera's sensitivities and tone curve still differ from the eye and
 *   the sRGB curve: ΔE00 about 2 [common-practice estimate; our card test on an ideal camera leaves
 *   under 2]. Without one, a lamp's cast is left in: ΔE00 5 or more (a 3000 K lamp leaves more than
 *   that in tests/unit/colour/photo.test.ts).
 */
const CARD_LRV_SHARE = 0.1;
const CAMERA_LRV_SHARE = 0.3;

export function estimateLikelyError(lrv: number, corrected: boolean): LikelyError {
  return corrected
    ? { lrv: Math.max(1, Math.round(lrv * CARD_LRV_SHARE)), deltaE: 2 }
    : { lrv: Math.max(2, Math.round(lrv * CAMERA_LRV_SHARE)), deltaE: 5 };
}

export function describeColour(lab: Lab): MeasuredColour {
  return { hex: toHex(lab), lab: roundLab(lab), lrv: roundLrv(lightReflectance(lab)) };
}

export function describeMeasurement(analysis: Analysis): Measurement {
  const colour = describeColour(analysis.representative);
  return {
    colour,
    palette: analysis.palette.map((p) => ({ hex: toHex(p.lab), lab: roundLab(p.lab), share: Math.round(p.share * 1000) / 1000 })),
    corrected: analysis.corrected,
    cardReflectance: analysis.reflectance === null ? null : Math.round(analysis.reflectance * 1000) / 10,
    likelyError: estimateLikelyError(colour.lrv, analysis.corrected),
  };
}

/** The upload's answer about colour: the measurement's fields, or `measured: false` and the plain reason there are none. */
export type UploadMeasurement = (Measurement & { measured: true }) | { measured: false; notMeasured: string };

export function describeUploadMeasurement(analysis: Analysis | null, notMeasured: string | null): UploadMeasurement {
  if (analysis) return { measured: true, ...describeMeasurement(analysis) };
  return { measured: false, notMeasured: notMeasured ?? "This photo couldn't be measured." };
}
