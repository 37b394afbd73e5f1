import { readFileSync } from "node:fs";
import Color from "colorjs.io";
import { describe, expect, it } from "vitest";
import type { PaletteName } from "@/components/ui/palette";
import { palette, textPairs, tokenName, uiPairs } from "@/components/ui/palette";

// WCAG 2.1 relative luminance and contrast ratio, written out from the W3C definitions
// so the test does not trust the colour library it is checking against.
function channel(c8: number): number {
  const c = c8 / 255;
  return c <= 0.03928 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
}
function luminance(hex: string): number {
  const n = Number.parseInt(hex.slice(1), 16);
  return 0.2126 * channel((n >> 16) & 255) + 0.7152 * channel((n >> 8) & 255) + 0.0722 * channel(n & 255);
}
function contrast(a: string, b: string): number {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x) as [number, number];
  return (hi + 0.05) / (lo + 0.05);
}

const css = readFileSync(new URL("../../../app/globals.css", import.meta.url), "utf8");
function token(name: PaletteName): string {
  const m = new RegExp(`${tokenName(name)}:\\s*(oklch\\([^)]*\\))`).exec(css);
  if (!m?.[1]) throw new Error(`${tokenName(name)} not found in globals.css`);
  return m[1];
}

describe("palette contrast (WCAG 2.1)", () => {
  it("formula matches known values", () => {
    expect(contrast("#000000", "#ffffff")).toBeCloseTo(21, 5);
    expect(contrast("#767676", "#ffffff")).toBeCloseTo(4.54, 2);
  });

  it.each(textPairs)("text %s on %s is at least 4.5:1", (fg, bg) => {
    expect(contrast(palette[fg], palette[bg])).toBeGreaterThanOrEqual(4.5);
  });

  it.each(uiPairs)("boundary/icon %s on %s is at least 3:1", (fg, bg) => {
    expect(contrast(palette[fg], palette[bg])).toBeGreaterThanOrEqual(3);
  });
});

describe("palette.ts matches the CSS tokens", () => {
  it.each(Object.keys(palette) as PaletteName[])("%s", (name) => {
    const fromCss = new Color(token(name)).to("srgb").toGamut().toString({ format: "hex", collapse: false });
    expect(fromCss).toBe(palette[name]);
  });
});

describe("viewing surround", () => {
  it.each(["surround", "surroundLight"] as const)("%s has no tint (CIELAB a*, b* ≈ 0)", (name) => {
    const [, a, b] = new Color(token(name)).to("lab-d65").coords;
    expect(Math.abs(a ?? 1)).toBeLessThan(0.01);
    expect(Math.abs(b ?? 1)).toBeLessThan(0.01);
  });

  it("the grey surround is a true mid-grey (L* 45–60)", () => {
    const [l] = new Color(token("surround")).to("lab-d65").coords;
    expect(l).toBeGreaterThan(45);
    expect(l).toBeLessThan(60);
  });
});
