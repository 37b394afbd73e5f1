import { convertSrgbToLab } from "./convert";
import { ColourInputError } from "./errors";
import type { Lab } from "./types";

const FORMATS = "Enter a colour as #RRGGBB, rgb(…), hsl(…) or lab(L a b)";
const NUMBER = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:e[+-]?\d+)?$/i;

function rejectInput(input: string, problem?: string): never {
  const shown = input.trim();
  const why = problem ?? (shown === "" ? "the box is empty." : `"${shown}" isn't one of those.`);
  throw new ColourInputError(`${FORMATS} — ${why}`);
}

/** Reads "12", "12.5%" or "40deg"; `percentOf` turns a percentage into the channel's own scale. */
function readNumber(token: string, input: string, percentOf?: number, allowDeg = false): number {
  let text = token;
  let scale = 1;
  if (text.endsWith("%")) {
    if (percentOf === undefined) rejectInput(input, `"${token}" can't be a percentage there.`);
    text = text.slice(0, -1);
    scale = percentOf / 100;
  } else if (allowDeg && text.toLowerCase().endsWith("deg")) {
    text = text.slice(0, -3);
  }
  if (!NUMBER.test(text)) rejectInput(input, `"${token}" isn't a number.`);
  return Number(text) * scale;
}

function checkRange(value: number, min: number, max: number, what: string, input: string): number {
  if (value < min || value > max) {
    rejectInput(input, `${what} runs from ${min} to ${max}, and "${input.trim()}" goes outside that.`);
  }
  return value;
}

function parseHex(hex: string, input: string): Lab {
  if (!/^[0-9a-f]+$/i.test(hex) || (hex.length !== 3 && hex.length !== 6)) rejectInput(input);
  const full = hex.length === 3 ? [...hex].map((c) => c + c).join("") : hex;
  const channel = (i: number): number => parseInt(full.slice(i, i + 2), 16) / 255;
  return convertSrgbToLab(channel(0), channel(2), channel(4));
}

function parseRgb(args: string[], input: string): Lab {
  const [r, g, b] = args.map((t) => checkRange(readNumber(t, input, 255), 0, 255, "Each rgb() value", input));
  return convertSrgbToLab((r ?? 0) / 255, (g ?? 0) / 255, (b ?? 0) / 255);
}

function convertHslToRgb(h: number, s: number, l: number): [number, number, number] {
  // CSS Color 4 hsl-to-rgb: each channel from its own offset around the hue circle.
  const hue = ((h % 360) + 360) % 360;
  const k = (n: number): number => (n + hue / 30) % 12;
  const a = s * Math.min(l, 1 - l);
  const f = (n: number): number => l - a * Math.max(-1, Math.min(k(n) - 3, 9 - k(n), 1));
  return [f(0), f(8), f(4)];
}

function parseHsl(args: string[], input: string): Lab {
  const h = readNumber(args[0] ?? "", input, undefined, true);
  const s = checkRange(readNumber((args[1] ?? "").replace(/%$/, ""), input), 0, 100, "Saturation", input);
  const l = checkRange(readNumber((args[2] ?? "").replace(/%$/, ""), input), 0, 100, "Lightness", input);
  const [r, g, b] = convertHslToRgb(h, s / 100, l / 100);
  return convertSrgbToLab(r, g, b);
}

function parseLab(args: string[], input: string): Lab {
  const L = checkRange(readNumber(args[0] ?? "", input, 100), 0, 100, "Lab lightness (L)", input);
  // CSS maps 100% of a/b to 125; kept so pasted CSS values read the same way.
  return [L, readNumber(args[1] ?? "", input, 125), readNumber(args[2] ?? "", input, 125)];
}

const PARSERS: Record<string, (args: string[], input: string) => Lab> = {
  rgb: parseRgb,
  rgba: parseRgb,
  hsl: parseHsl,
  hsla: parseHsl,
  lab: parseLab,
};

/**
 * Reads a colour a designer typed. `lab(L a b)` is taken as CIELAB relative to D65,
 * deliberately unlike CSS/colorjs.io, whose lab() is D50.
 */
export function parseColour(input: string): Lab {
  const text = input.trim().toLowerCase();
  if (text.startsWith("#")) return parseHex(text.slice(1), input);
  const match = /^([a-z]+)\(\s*([^()]*?)\s*\)$/.exec(text);
  const parser = match ? PARSERS[match[1] ?? ""] : undefined;
  if (!match || !parser) rejectInput(input);
  const body = match[2] ?? "";
  // Finishes are opaque; a slash or a fourth value would be transparency, which we don't model.
  const args = body.split(/\s*,\s*|\s+/).filter((t) => t !== "");
  if (body.includes("/") || args.length !== 3) {
    rejectInput(input, `"${input.trim()}" needs exactly three values, like rgb(200, 190, 170).`);
  }
  return parser(args, input);
}
