import type { ColourSource } from "@/db/schema/library";
import { lightReflectance, parseColour } from "@/lib/colour";
import type { Lab } from "@/lib/colour";
import type { ColourInput } from "./finish";

export type SettledColour = { lab: Lab; colourSource: ColourSource; lrv: number; lrvSource: ColourSource };

/** A colour already known as Lab (a stored finish), or one as the form sends it. */
export type ColourBasis = ColourInput | { source: ColourSource; lab: Lab };

// CIE 15:2004 break point of the L* curve: (6/29)³ and (29/3)³.
const EPSILON = 216 / 24389;
const KAPPA = 24389 / 27;

/** L* of a colour with this LRV (CIE Y × 100): the CIE L* definition. */
export function lightnessForLrv(lrv: number): number {
  const y = Math.min(100, Math.max(0, lrv)) / 100;
  return y > EPSILON ? 116 * Math.cbrt(y) - 16 : KAPPA * y;
}

/** LRVs are published whole or to one decimal; a computed one claims no more. */
export function roundLrv(value: number): number {
  return Math.round(value * 10) / 10;
}

export function roundLab(lab: Lab): [number, number, number] {
  return [Math.round(lab[0] * 100) / 100, Math.round(lab[1] * 100) / 100, Math.round(lab[2] * 100) / 100];
}

/**
 * The colour and LRV a finish is saved with. A published LRV always wins over one computed from
 * a colour (PRODUCT.md: "Where the manufacturer publishes an LRV, that figure wins"); without one
 * the LRV is CIE Y × 100 of the colour, marked as from the photo or computed. Null when the colour
 * is to come from the LRV alone and there is no LRV.
 */
export function settleColour(colour: ColourBasis, publishedLrv: number | null): SettledColour | null {
  let lab: Lab | null;
  if (colour.source === "computed") lab = publishedLrv == null ? null : [lightnessForLrv(publishedLrv), 0, 0];
  else if ("lab" in colour) lab = colour.lab;
  else lab = parseColour(colour.value);
  if (!lab) return null;
  const colourSource = colour.source;
  if (publishedLrv != null) return { lab, colourSource, lrv: publishedLrv, lrvSource: "published" };
  return { lab, colourSource, lrv: roundLrv(lightReflectance(lab)), lrvSource: colourSource === "photo" ? "photo" : "computed" };
}
