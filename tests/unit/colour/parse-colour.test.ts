import { Lab_D65, OKLCH, sRGB, to } from "colorjs.io/fn";
import { describe, expect, it } from "vitest";
import { ColourInputError, deltaE2000, parseColour, toHex } from "../../../lib/colour";
import type { Lab } from "../../../lib/colour";

// colorjs.io's lab-d65 space as an outside reference for sRGB → CIELAB (D65).
function convertWithColorjs(r: number, g: number, b: number): Lab {
  const [L, a, bb] = to({ space: sRGB, coords: [r, g, b], alpha: 1 }, Lab_D65).coords;
  return [L ?? NaN, a ?? NaN, bb ?? NaN];
}

function expectLabClose(actual: Lab, expected: Lab, digits = 6): void {
  actual.forEach((v, i) => expect(v).toBeCloseTo(expected[i] ?? NaN, digits));
}

describe("parseColour", () => {
  // [published: IEC 61966-2-1 sRGB white is D65, so #ffffff is L* 100, a* = b* = 0 in CIELAB (D65)]
  it("reads white and black hex as L* 100 and 0", () => {
    expectLabClose(parseColour("#ffffff"), [100, 0, 0], 4);
    expectLabClose(parseColour("#000"), [0, 0, 0], 6);
  });

  // [reference library: colorjs.io 0.7.1 sRGB → lab-d65]
  it("agrees with colorjs.io for hex, rgb() and hsl()", () => {
    expectLabClose(parseColour("#c8b49a"), convertWithColorjs(200 / 255, 180 / 255, 154 / 255));
    expectLabClose(parseColour("#AbC"), convertWithColorjs(0xaa / 255, 0xbb / 255, 0xcc / 255));
    expectLabClose(parseColour("rgb(200, 180, 154)"), convertWithColorjs(200 / 255, 180 / 255, 154 / 255));
    expectLabClose(parseColour("rgb(200 180 154)"), convertWithColorjs(200 / 255, 180 / 255, 154 / 255));
    expectLabClose(parseColour("rgb(100%, 50%, 0%)"), convertWithColorjs(1, 0.5, 0));
    // [published: CSS Color 4 hsl(): hsl(120 50% 40%) is rgb(51, 153, 51)]
    expectLabClose(parseColour("hsl(120, 50%, 40%)"), convertWithColorjs(51 / 255, 153 / 255, 51 / 255));
    expectLabClose(parseColour("hsl(120deg 50 40)"), convertWithColorjs(51 / 255, 153 / 255, 51 / 255));
  });

  // Our lab() is D65 on purpose; CSS / colorjs.io lab() would be D50. [project decision, see brief]
  it("takes lab(L a b) as D65 coordinates, unconverted", () => {
    expect(parseColour("lab(62.5 -3 12.25)")).toEqual([62.5, -3, 12.25]);
    expect(parseColour("  LAB(50, 10, -10) ")).toEqual([50, 10, -10]);
  });

  // [project rule: bad input throws ColourInputError with a message a designer understands]
  it.each(["", "banana", "#12", "#gggggg", "rgb(1,2)", "lab(10)", "#12345", "rgb(300, 0, 0)", "hsl(10, 50%)", "oklch(0.5 0.1 20)", "rgb(1, 2, 3, 0.5)", "red"])(
    "rejects %j with ColourInputError",
    (input) => {
      expect(() => parseColour(input)).toThrow(ColourInputError);
    },
  );

  it("says what it accepts in plain words", () => {
    expect(() => parseColour("banana")).toThrow(
      'Enter a colour as #RRGGBB, rgb(…), hsl(…) or lab(L a b) — "banana" isn\'t one of those.',
    );
    expect(() => parseColour("")).toThrow(/the box is empty/);
  });
});

describe("toHex", () => {
  // [published: IEC 61966-2-1 round trip of 8-bit sRGB through CIELAB]
  it.each(["#ffffff", "#000000", "#c8b49a", "#336699", "#767676", "#0a0b0c"])("round-trips %s", (hex) => {
    expect(toHex(parseColour(hex))).toBe(hex);
  });

  it("writes lowercase six-digit hex [project spec]", () => {
    expect(toHex(parseColour("#ABC"))).toBe("#aabbcc");
  });

  // [published: CSS Color 4 §13.2 gamut mapping: reduce OKLCh chroma, keeping OKLCh lightness and hue
  // (to within its JND of 0.02), instead of clipping channels, which shifts hue]
  it("gamut-maps colours outside sRGB by keeping OKLCh lightness and hue", () => {
    const vivid: Lab = [50, 120, -30];
    const hex = toHex(vivid);
    expect(hex).toMatch(/^#[0-9a-f]{6}$/);
    const oklchOf = (lab: Lab) => to({ space: Lab_D65, coords: [lab[0], lab[1], lab[2]], alpha: 1 }, OKLCH).coords;
    const [l0, c0, h0] = oklchOf(vivid);
    const [l1, c1, h1] = oklchOf(parseColour(hex));
    expect(Math.abs((l1 ?? NaN) - (l0 ?? NaN))).toBeLessThan(0.02);
    expect(Math.abs((h1 ?? NaN) - (h0 ?? NaN))).toBeLessThan(3);
    expect(c1 ?? NaN).toBeLessThan(c0 ?? NaN);
    expect(deltaE2000(parseColour(hex), vivid)).toBeGreaterThan(1); // it did have to move
  });
});
