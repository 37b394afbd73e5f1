import { readFileSync } from "node:fs";
import path from "node:path";
import Color from "colorjs.io";
import { describe, expect, it } from "vitest";
import { paintSurround, SURROUND_HEX } from "@/lib/boards/lights";
import { LIGHTS, paintUnderLight, parseColour, toHex } from "@/lib/colour";
import type { Lab } from "@/lib/colour";
import { convertLabToXyz, convertSrgbToLab } from "@/lib/colour/convert";

const LAMPS = LIGHTS.filter((l) => l.id !== "daylight").map((l) => l.cct);
const paint = (hex: string, cct: number): Lab => parseColour(paintUnderLight(parseColour(hex), cct));
const channels = (hex: string): number[] => [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16));
const xy = (lab: Lab): [number, number] => {
  const [X, Y, Z] = convertLabToXyz(lab);
  return [X / (X + Y + Z), Y / (X + Y + Z)];
};
const hue = (lab: Lab): number => ((Math.atan2(lab[2], lab[1]) * 180) / Math.PI + 360) % 360;

describe("swatches painted under a lamp", () => {
  it("are the stored colours in daylight [definition: D65 adapted to itself]", () => {
    for (const hex of ["#ffffff", "#f2eee3", "#336699", "#2c3a4b", SURROUND_HEX]) expect(paintUnderLight(parseColour(hex), 6504)).toBe(toHex(parseColour(hex)));
  });

  // The case: #f2eee3 came out less warm at 2700 K than at 4000 K once clipped. [common practice:
  // the lower the colour temperature the warmer a pale finish looks, DOMAIN.md "2700–3000 K warms pale finishes"]
  it("never paints #f2eee3 less warm at a lower colour temperature", () => {
    const cct = [2700, 2800, 2900, 3000, 3200, 3500, 4000, 4500, 5000];
    const warmth = cct.map((t) => paint("#f2eee3", t)[2]);
    for (let i = 1; i < warmth.length; i++) expect(warmth[i - 1]).toBeGreaterThanOrEqual(warmth[i] ?? Infinity);
    expect(warmth[0]).toBeGreaterThan(parseColour("#f2eee3")[2] + 2);
  });

  it("keeps white the screen's white, a little warm, and the same colour as the surround", () => {
    let previous = Infinity;
    for (const cct of LAMPS) {
      const hex = paintUnderLight(parseColour("#ffffff"), cct);
      const rgb = channels(hex);
      expect(Math.max(...rgb)).toBe(255); // the brightest colour the screen shows
      expect(Math.min(...rgb)).toBeGreaterThanOrEqual(0xe0); // "#ffffff-ish"
      // The white and the grey surround are both neutrals: the same chromaticity, to 8-bit rounding.
      const [wx, wy] = xy(parseColour(hex));
      const [sx, sy] = xy(parseColour(paintSurround(cct)));
      expect(Math.abs(wx - sx)).toBeLessThan(0.003);
      expect(Math.abs(wy - sy)).toBeLessThan(0.003);
      // Warmer lamps (LIGHTS runs 2700, 3000, 4000 K) leave a warmer white: less blue.
      expect(255 - (rgb[2] ?? 0)).toBeLessThanOrEqual(previous);
      previous = 255 - (rgb[2] ?? 0);
    }
    expect(previous).toBeGreaterThan(0);
    expect(paintUnderLight(parseColour("#ffffff"), 6504)).toBe("#ffffff");
  });

  it("keeps pure white the lightest and next to an off-white both move together (no white left at #ffffff while the rest turns yellow)", () => {
    for (const cct of LAMPS) {
      const white = paint("#ffffff", cct);
      const off = paint("#fafafa", cct);
      expect(white[0]).toBeGreaterThan(off[0]);
      const [wx, wy] = xy(white);
      const [ox, oy] = xy(off);
      expect(Math.abs(wx - ox)).toBeLessThan(0.003);
      expect(Math.abs(wy - oy)).toBeLessThan(0.003);
    }
  });

  it("keeps the hue order of a ring of finishes and the lightness order of a ramp", () => {
    const ring = Array.from({ length: 12 }, (_, k): Lab => [60, 30 * Math.cos((k * Math.PI) / 6), 30 * Math.sin((k * Math.PI) / 6)]);
    const ramp: Lab[] = [95, 85, 75, 60, 45, 30, 15].map((L) => [L, 2, 6]);
    for (const cct of LAMPS) {
      const hues = ring.map((c) => hue(parseColour(paintUnderLight(c, cct))));
      const start = hues.indexOf(Math.min(...hues));
      const turned = [...hues.slice(start), ...hues.slice(0, start)];
      expect(turned).toEqual([...turned].sort((p, q) => p - q));
      const L = ramp.map((c) => parseColour(paintUnderLight(c, cct))[0]);
      expect(L).toEqual([...L].sort((p, q) => q - p));
    }
  });

  // [reference library: colorjs.io 0.7.1 toGamut "css" (CSS Color 4) keeps OKLCh hue while it reduces chroma]
  it("brings saturated colours into sRGB by reducing chroma, not by clipping channels", () => {
    for (const hex of ["#ff0000", "#00ff00", "#0000ff", "#ffff00", "#00ffff", "#ff00ff"]) {
      for (const cct of LAMPS) {
        const painted = new Color(paintUnderLight(parseColour(hex), cct)).to("oklch").coords[2] ?? NaN;
        const daylight = new Color(hex).to("oklch").coords[2] ?? NaN;
        const turn = Math.abs(((painted - daylight + 540) % 360) - 180);
        expect(turn).toBeLessThan(12);
      }
    }
  });
});

describe("the board's surround", () => {
  it("is the neutral grey globals.css paints, #7c7c7c [reference library: colorjs.io parses oklch(0.5863 0 0)]", () => {
    const css = readFileSync(path.resolve("app/globals.css"), "utf8");
    const value = /--color-surround:\s*([^;]+);/.exec(css)?.[1] ?? "";
    const rgb = new Color(value.trim()).to("srgb").coords.map((c) => Math.round((c ?? 0) * 255));
    expect(rgb).toEqual(channels(SURROUND_HEX));
    expect(convertSrgbToLab(0x7c / 255, 0x7c / 255, 0x7c / 255)[1]).toBeCloseTo(0, 6);
  });

  it("is painted warmer under a warmer lamp, with the swatches", () => {
    const b = [...LAMPS, 6504].map((cct) => parseColour(paintSurround(cct))[2]);
    for (let i = 1; i < b.length; i++) expect(b[i - 1]).toBeGreaterThan(b[i] ?? Infinity);
  });
});
