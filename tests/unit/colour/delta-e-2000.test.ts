import { deltaE2000 as referenceDeltaE2000, Lab as ColorjsLabD50 } from "colorjs.io/fn";
import { describe, expect, it } from "vitest";
import { deltaE2000 } from "../../../lib/colour";
import type { Lab } from "../../../lib/colour";
import sharma from "../../fixtures/ciede2000-sharma-2005.json";
import { createRandomLab, createSeededRandom } from "./seeded-random";

type SharmaPair = { pair: number; L1: number; a1: number; b1: number; L2: number; a2: number; b2: number; dE00: number };
const pairs: SharmaPair[] = sharma.pairs;

// colorjs.io as a reference implementation. Both colours are built in its own `lab` space
// with the raw coordinates, so its deltaE2000 sees exactly our numbers: ΔE2000 is defined on
// coordinates, and nothing is converted (its `lab` being D50 doesn't matter here).
function computeReference(x: Lab, y: Lab): number {
  return referenceDeltaE2000(
    { space: ColorjsLabD50, coords: [x[0], x[1], x[2]], alpha: 1 },
    { space: ColorjsLabD50, coords: [y[0], y[1], y[2]], alpha: 1 },
  );
}

describe("deltaE2000", () => {
  it("has the fixture's provenance [published: Sharma, Wu & Dalal 2005, Table 1]", () => {
    expect(sharma.source).toMatch(/Sharma/);
    expect(sharma.checked).toBeTruthy();
    expect(pairs).toHaveLength(34);
  });

  // [published: Sharma, Wu & Dalal (2005), Color Res. Appl. 30(1):21–30, Table 1; values given to 4 decimals]
  it.each(pairs)("matches Sharma et al. (2005) pair $pair to 1e-4", (p) => {
    expect(Math.abs(deltaE2000([p.L1, p.a1, p.b1], [p.L2, p.a2, p.b2]) - p.dE00)).toBeLessThan(1e-4);
  });

  // [published: Sharma et al. (2005) §"mathematical observations": ΔE00 is symmetric in its arguments]
  it.each(pairs)("is symmetric for Sharma pair $pair", (p) => {
    const x: Lab = [p.L1, p.a1, p.b1];
    const y: Lab = [p.L2, p.a2, p.b2];
    expect(deltaE2000(x, y)).toBe(deltaE2000(y, x));
  });

  // [reference library: colorjs.io 0.7.1 deltaE2000, compared on raw coordinates]
  it("agrees with colorjs.io's deltaE2000 on 5,000 random colour pairs", () => {
    const random = createSeededRandom(2005);
    for (let i = 0; i < 5000; i++) {
      const x = createRandomLab(random);
      // Half the pairs close together, where finishes are actually compared.
      const y: Lab =
        i % 2 === 0
          ? [x[0] + random() * 6 - 3, x[1] + random() * 6 - 3, x[2] + random() * 6 - 3]
          : createRandomLab(random);
      expect(deltaE2000(x, y)).toBeCloseTo(computeReference(x, y), 9);
    }
  });

  // [published: CIE 142-2001 as restated by Sharma et al. (2005): neutral colours have hue 0; ΔE of a colour with itself is 0]
  it("handles neutrals and identical colours", () => {
    expect(deltaE2000([50, 0, 0], [50, 0, 0])).toBe(0);
    expect(deltaE2000([0, 0, 0], [100, 0, 0])).toBeCloseTo(computeReference([0, 0, 0], [100, 0, 0]), 9);
    expect(deltaE2000([50, 0, 0], [60, 0, 0])).toBeCloseTo(computeReference([50, 0, 0], [60, 0, 0]), 9);
  });
});
