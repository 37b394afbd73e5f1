import { LIGHTS } from "@/lib/colour";
import type { LightPreset } from "@/lib/colour";

/** The daylight preset (D65): the light every stored colour and LRV is measured under. */
export const DAYLIGHT = LIGHTS.find((l) => l.id === "daylight") as LightPreset;

/** The CCTs a board may be viewed under, as `?cct=` accepts them. */
export const LIGHT_CCTS = LIGHTS.map((l) => l.cct);

export function findLight(cct: number): LightPreset | undefined {
  return LIGHTS.find((l) => l.cct === cct);
}

/** A page's `?cct=`: one of the lights, or daylight for anything else (a page never errors on it). */
export function lightFromParam(raw: string | string[] | undefined): number {
  const cct = Number(Array.isArray(raw) ? raw[0] : raw);
  return LIGHT_CCTS.includes(cct) ? cct : DAYLIGHT.cct;
}

/** "in daylight" or "under warm white 2700 K"; capitalised to start a sentence. */
export function describeLight(light: { id: string; label: string }, startOfSentence = false): string {
  const phrase = light.id === "daylight" ? "in daylight" : `under ${light.label.charAt(0).toLowerCase()}${light.label.slice(1)}`;
  return startOfSentence ? phrase.charAt(0).toUpperCase() + phrase.slice(1) : phrase;
}
