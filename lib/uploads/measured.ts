import { lightReflectance, toHex } from "@/lib/colour";
import type { Lab } from "@/lib/colour";
import { roundLab, roundLrv } from "@/lib/validation/finish-colour";

export type MeasuredColour = { hex: string; lab: [number, number, number]; lrv: number };
export type PaletteEntry = { hex: string; lab: [number, number, number]; share: number };
/** What the upload and re-measure routes answer about a photo's colour. */
export type Measurement = { colour: MeasuredColour; palette: PaletteEntry[]; corrected: boolean };

export function describeColour(lab: Lab): MeasuredColour {
  return { hex: toHex(lab), lab: roundLab(lab), lrv: roundLrv(lightReflectance(lab)) };
}

export function describeMeasurement(analysis: { representative: Lab; palette: { lab: Lab; share: number }[]; corrected: boolean }): Measurement {
  return {
    colour: describeColour(analysis.representative),
    palette: analysis.palette.map((p) => ({ hex: toHex(p.lab), lab: roundLab(p.lab), share: Math.round(p.share * 1000) / 1000 })),
    corrected: analysis.corrected,
  };
}
