import { describe, expect, it } from "vitest";
import { LIGHTS, parseColour, underLight } from "../../../lib/colour";
import type { Lab } from "../../../lib/colour";
import { computeBradfordMatrix } from "../../../lib/colour/chromatic-adaptation";
import { D65_WHITE } from "../../../lib/colour/convert";
import { computeDaylightXy } from "../../../lib/colour/white-point";

const white = parseColour("#ffffff");
const samples: Lab[] = [white, parseColour("#c8b49a"), parseColour("#336699"), [35, 20, -10], [70, -25, 15]];

describe("white points", () => {
  // [published: CIE 15:2004 Table T.3 — D65 (0.3127, 0.3290) at 6504 K, D50 (0.3457, 0.3585) at 5003 K, D75 (0.2990, 0.3149) at 7504 K]
  it("puts the CIE daylight locus on D65, D50 and D75", () => {
    const close = (xy: [number, number], x: number, y: number): void => {
      expect(Math.abs(xy[0] - x)).toBeLessThan(3e-4);
      expect(Math.abs(xy[1] - y)).toBeLessThan(3e-4);
    };
    close(computeDaylightXy(6504), 0.3127, 0.329);
    close(computeDaylightXy(5003), 0.3457, 0.3585);
    close(computeDaylightXy(7504), 0.299, 0.3149);
  });

  // [reference library: colorjs.io 0.7.1 adapt.js hard-codes the Bradford D65→D50 matrix]
  it("builds the same Bradford D65→D50 matrix as colorjs.io", () => {
    const d50 = [0.3457 / 0.3585, 1, (1 - 0.3457 - 0.3585) / 0.3585] as const;
    const expected = [
      1.0479297925449969, 0.022946870601609652, -0.05019226628920524, 0.02962780877005599, 0.9904344267538799,
      -0.017073799063418826, -0.009243040646204504, 0.015055191490298152, 0.7518742814281371,
    ];
    computeBradfordMatrix(D65_WHITE, d50).forEach((v, i) => expect(v).toBeCloseTo(expected[i] ?? NaN, 6));
  });
});

describe("underLight", () => {
  it("returns the colour unchanged under daylight (D65, 6504 K) [definition: adapting D65 to itself is the identity]", () => {
    for (const lab of samples) expect(underLight(lab, 6504)).toEqual(lab);
    const preset = LIGHTS.find((l) => l.id === "daylight");
    expect(preset?.cct).toBe(6504);
  });

  // The black-body locus and the lamps' adaptation are tested in planckian.test.ts, lamp-verdicts.test.ts
  // and lamp-paint.test.ts.
  it("sees a white paper as white under every lamp, once adapted to it [definition: von Kries maps white to white]", () => {
    for (const cct of [2700, 3000, 4000]) underLight(white, cct).forEach((v, i) => expect(v).toBeCloseTo(white[i] ?? NaN, 9));
  });

  it("offers the four light presets [project spec]", () => {
    expect(LIGHTS.map((l) => [l.id, l.cct])).toEqual([
      ["2700", 2700],
      ["3000", 3000],
      ["4000", 4000],
      ["daylight", 6504],
    ]);
    expect(LIGHTS[0]?.label).toBe("Warm white 2700 K");
    expect(LIGHTS[3]?.label).toBe("Daylight (D65)");
  });

  it("refuses colour temperatures outside the black-body locus Mottle offers (1000–25000 K)", () => {
    expect(() => underLight(white, 500)).toThrow(RangeError);
    expect(() => underLight(white, Number.NaN)).toThrow(RangeError);
  });
});
