import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { computePlanckianXy, PLANCK_C2 } from "../../../lib/colour/planckian";
import { computeLampWhite, computeLightXy } from "../../../lib/colour/white-point";
import { D65_WHITE } from "../../../lib/colour/convert";

// [published: the CIE 1931 2° colour-matching functions at 1 nm, 360–830 nm; source named in the fixture's header]
const cmf = readFileSync(path.resolve("tests/fixtures/cie-1931-2deg-cmf.csv"), "utf8")
  .split("\n")
  .filter((line) => /^\d/.test(line))
  .map((line) => line.split(",").map(Number) as [number, number, number, number]);

/** Planck's law × the 1 nm CMFs, summed independently of lib/colour's 5 nm table. */
function planckXyAt1nm(kelvin: number, c2 = 1.4388e-2): [number, number] {
  let X = 0;
  let Y = 0;
  let Z = 0;
  for (const [nm, x, y, z] of cmf) {
    const m = nm * 1e-9;
    const M = 1 / (m ** 5 * (Math.exp(c2 / (m * kelvin)) - 1));
    X += M * x;
    Y += M * y;
    Z += M * z;
  }
  return [X / (X + Y + Z), Y / (X + Y + Z)];
}

/** The CIE 1960 UCS Planckian approximation of Krystek (1985), coefficients as quoted [memory]. */
function krystekUv(T: number): [number, number] {
  const u = (0.860117757 + 1.54118254e-4 * T + 1.28641212e-7 * T * T) / (1 + 8.42420235e-4 * T + 7.08145163e-7 * T * T);
  const v = (0.317398726 + 4.22806245e-5 * T + 4.20481691e-8 * T * T) / (1 - 2.89741816e-5 * T + 1.61456053e-7 * T * T);
  return [u, v];
}

const toUv = ([x, y]: [number, number]): [number, number] => [(4 * x) / (-2 * x + 12 * y + 3), (6 * y) / (-2 * x + 12 * y + 3)];

describe("the black-body locus", () => {
  it("uses c2 = 1.4388e-2 m·K [published: CIE 15:2018, Planck's law for Planckian radiators]", () => {
    expect(PLANCK_C2).toBe(1.4388e-2);
  });

  it.each([2700, 3000, 4000, 2856, 6500])("at %i K agrees with Planck's law × the 1 nm CIE 1931 2° table to 3e-5", (T) => {
    // [published: CIE 1931 2° CMFs, tests/fixtures/cie-1931-2deg-cmf.csv] 5 nm against 1 nm summation.
    const [x, y] = computePlanckianXy(T);
    const [rx, ry] = planckXyAt1nm(T);
    expect(Math.abs(x - rx)).toBeLessThan(3e-5);
    expect(Math.abs(y - ry)).toBeLessThan(3e-5);
  });

  it("puts 2856 K on CIE Illuminant A (0.44757, 0.40745) [published: CIE 15:2004 Table T.3; A is that black body]", () => {
    const [x, y] = computePlanckianXy(2856);
    expect(Math.abs(x - 0.44757)).toBeLessThan(1e-4);
    expect(Math.abs(y - 0.40745)).toBeLessThan(1e-4);
  });

  it("gives the lamps' whites: 2700 K (0.4599, 0.4106), 3000 K (0.4369, 0.4041), 4000 K (0.3804, 0.3768) [memory: commonly tabulated Planckian values; the 1 nm sum above is the check that counts]", () => {
    const expected: [number, number, number][] = [
      [2700, 0.4599, 0.4106],
      [3000, 0.4369, 0.4041],
      [4000, 0.3804, 0.3768],
    ];
    for (const [T, x, y] of expected) {
      const [cx, cy] = computeLightXy(T);
      expect(Math.abs(cx - x)).toBeLessThan(1e-4);
      expect(Math.abs(cy - y)).toBeLessThan(1e-4);
    }
  });

  it("agrees with Krystek's 1985 approximation to its stated accuracy, about 1e-4 in u, v [published: Krystek 1985, as quoted; coefficients from memory]", () => {
    for (let T = 1000; T <= 15000; T += 250) {
      const [u, v] = toUv(computePlanckianXy(T));
      const [ku, kv] = krystekUv(T);
      expect(Math.abs(u - ku)).toBeLessThan(1.2e-4);
      expect(Math.abs(v - kv)).toBeLessThan(1.2e-4);
    }
  });

  it("uses D65 itself for daylight, so daylight adapts to nothing [definition: CIE 15 D65 at 6504 K]", () => {
    expect(computeLampWhite(6504)).toEqual(D65_WHITE);
  });

  it("refuses temperatures outside 1000–25000 K", () => {
    expect(() => computePlanckianXy(500)).toThrow(RangeError);
    expect(() => computePlanckianXy(Number.NaN)).toThrow(RangeError);
  });
});
