import { computeLightXy, LIGHTS, paintUnderLight, parseColour } from "@/lib/colour";
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

/** The neutral ground finishes are judged on (globals.css `--color-surround`, about L* 52). */
export const SURROUND_HEX = "#7c7c7c";
const SURROUND_LAB = parseColour(SURROUND_HEX);

/** The surround painted as the swatches on it are, so the whole board shifts together. */
export function paintSurround(cct: number): string {
  return paintUnderLight(SURROUND_LAB, cct);
}

/** What a lamp preview can and cannot show, said the same way to designers and clients. */
export const LAMP_NOTICE =
  "Without the lamp's spectrum, Mottle can't show a real change between finishes under this light; the colours are shown as an eye adapted to it sees them, and the checks are the daylight ones.";

/** The lamp's white point and the method, for the notice: "x 0.4599, y 0.4106 …". */
export function describeLampMethod(cct: number): string {
  const [x, y] = computeLightXy(cct);
  return `Lamp white x ${x.toFixed(4)}, y ${y.toFixed(4)}: a black body at ${cct} K (Planckian locus, CIE 15). Colours adapted to it by Bradford (von Kries), as far as the eye adapts in a room at about 300 lux (CIECAM02).`;
}

/** The line that goes with every lamp's checks. */
export const LAMP_CHECKS_NOTE =
  "Same verdicts as in daylight: Mottle has no spectrum for this lamp, so nothing can change between finishes. LRVs belong to the surface and are measured in daylight.";
