import { Lab_D65, sRGB, toGamutCSS } from "colorjs.io/fn";
import { convertLabToXyz, convertXyzToLinearRgb, encodeSrgb } from "./convert";
import type { Lab } from "./types";

// Half a step of an 8-bit channel: anything closer than this to the gamut edge rounds the same.
const IN_GAMUT_SLACK = 0.5 / 255;

function formatChannel(v: number): string {
  return Math.round(Math.min(1, Math.max(0, v)) * 255)
    .toString(16)
    .padStart(2, "0");
}

/**
 * Lab (D65) → lowercase #rrggbb. Colours outside sRGB are gamut-mapped with the CSS Color 4
 * algorithm (colorjs.io's toGamutCSS), which keeps lightness and hue and gives up chroma,
 * rather than clipping channels, which shifts hue.
 */
export function toHex(lab: Lab): string {
  if (!lab.every((v) => Number.isFinite(v))) throw new RangeError("toHex needs three finite Lab numbers.");
  const linear = convertXyzToLinearRgb(convertLabToXyz(lab));
  let rgb = linear.map(encodeSrgb);
  if (rgb.some((v) => v < -IN_GAMUT_SLACK || v > 1 + IN_GAMUT_SLACK)) {
    const mapped = toGamutCSS({ space: Lab_D65, coords: [lab[0], lab[1], lab[2]], alpha: 1 }, { space: sRGB });
    rgb = mapped.coords.map((c) => (typeof c === "number" ? c : 0));
  }
  return `#${rgb.map(formatChannel).join("")}`;
}
