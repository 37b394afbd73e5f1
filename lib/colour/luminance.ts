import { convertLightnessToY } from "./convert";
import { parseColour } from "./parse-colour";
import type { Lab } from "./types";

function readLab(x: Lab | string): Lab {
  return typeof x === "string" ? parseColour(x) : x;
}

function clamp(v: number, min: number, max: number): number {
  return Math.min(max, Math.max(min, v));
}

/** CIE relative luminance (white = 1) of a colour, clamped to the physical 0–1. */
export function computeLuminance(x: Lab | string): number {
  return clamp(convertLightnessToY(readLab(x)[0]), 0, 1);
}

/**
 * Light reflectance value, 0–100: CIE Y (D65) × 100. A screen or photo estimate only; a supplier's
 * measured LRV should win whenever there is one.
 */
export function lightReflectance(x: Lab | string): number {
  return computeLuminance(x) * 100;
}

/**
 * WCAG 2.x contrast ratio (L1 + 0.05) / (L2 + 0.05), 1 to 21. Uses the colour's CIE Y, which for
 * sRGB colours is WCAG's relative luminance (WCAG's 0.03928 knee vs sRGB's 0.04045 differs by < 0.001).
 */
export function contrastRatio(x: Lab | string, y: Lab | string): number {
  return computeContrastRatio(computeLuminance(x), computeLuminance(y));
}

/** Contrast ratio from two luminances already known (0–1); order doesn't matter. */
export function computeContrastRatio(yA: number, yB: number): number {
  const lighter = Math.max(yA, yB);
  const darker = Math.min(yA, yB);
  return (lighter + 0.05) / (darker + 0.05);
}

/**
 * Luminance contrast in percent from two LRVs, by the Bowman–Sapolinski formula as quoted for
 * AS 1428.1: C = 125 × (Y2 − Y1) / (Y1 + Y2 + 25), Y2 the lighter. Symmetric in its arguments.
 */
export function luminanceContrast(lrvA: number, lrvB: number): number {
  const lighter = Math.max(lrvA, lrvB);
  const darker = Math.min(lrvA, lrvB);
  return (125 * (lighter - darker)) / (lighter + darker + 25);
}
