import { LIGHTS } from "@/lib/colour";
import type { LightPreset } from "@/lib/colour";

/** The daylight preset (D65): the light every stored colour and LRV is measured under. */
export const DAYLIGHT = LIGHTS.find((l) => l.id === "daylight") as LightPreset;

/** The CCTs a board may be viewed under, as `?cct=` accepts them. */
export const LIGHT_CCTS = LIGHTS.map((l) => l.cct);

export function findLight(cct: number): LightPreset | undefined {
  return LIGHTS.find((l) => l.cct === cct);
}
