import fc from "fast-check";
import { environment, M } from "colorjs.io/src/spaces/cam16.js";
import { describe, expect, it } from "vitest";
import { computeBoardChecks } from "@/lib/boards/board-checks";
import { assessPair, defaultThresholds, deltaE2000, LAMP_ADAPTATION, LIGHTS, underLight } from "@/lib/colour";
import type { Lab } from "@/lib/colour";
import { applyMatrix, computeBradfordMatrix, computeDegreeOfAdaptation } from "@/lib/colour/chromatic-adaptation";
import { D65_WHITE } from "@/lib/colour/convert";
import { computeLampWhite } from "@/lib/colour/white-point";

const LAMPS = LIGHTS.filter((l) => l.id !== "daylight").map((l) => l.cct);

// The two near-white paints meant to match (Lab D65) from the issue "records and checks that tell the truth".
const PAINT_A: Lab = [90.1, -1.29, 2.37];
const PAINT_B: Lab = [90.69, -0.16, 4.09];

const lab = fc.tuple(fc.double({ min: 5, max: 98, noNaN: true }), fc.double({ min: -60, max: 60, noNaN: true }), fc.double({ min: -60, max: 60, noNaN: true }));
// Near-whites and near-neutrals, where the old lamp preview flipped most verdicts.
const nearWhite = fc.tuple(fc.double({ min: 80, max: 97, noNaN: true }), fc.double({ min: -3, max: 3, noNaN: true }), fc.double({ min: -2, max: 8, noNaN: true }));
const finish = fc.oneof(lab, nearWhite);
const pairCase = fc.record({
  a: finish,
  b: finish,
  lrvA: fc.double({ min: 2, max: 92, noNaN: true }),
  lrvB: fc.double({ min: 2, max: 92, noNaN: true }),
  intent: fc.constantFrom("match" as const, "contrast" as const),
  accessRelevant: fc.boolean(),
});

describe("the observer adapted to a lamp", () => {
  // [published: Lam 1985 / CIE 15 — a von Kries transform maps the source white onto the destination white]
  it("is a real Bradford adaptation: D65 goes to the lamp's white", () => {
    for (const cct of LAMPS) {
      const white = applyMatrix(computeBradfordMatrix(D65_WHITE, computeLampWhite(cct)), D65_WHITE);
      computeLampWhite(cct).forEach((v, i) => expect(white[i]).toBeCloseTo(v, 12));
    }
  });

  // [definition: CIELAB relative to the lamp's white after Bradford is the daylight CIELAB when the lamp's
  // colours are themselves Bradford estimates; nothing without a spectrum can do better]
  it("sees every finish with its daylight CIELAB, to rounding", () => {
    fc.assert(
      fc.property(lab, fc.constantFrom(...LAMPS), (c, cct) => {
        const seen = underLight(c, cct);
        for (let i = 0; i < 3; i++) expect(Math.abs((seen[i] ?? NaN) - (c[i] ?? NaN))).toBeLessThan(1e-9);
      }),
      { numRuns: 500 },
    );
  });

  it("keeps the two near-white paints apart by their daylight 2.29 ΔE00 under every lamp [reference: the issue's figure; CIEDE2000, Sharma et al. 2005]", () => {
    const daylight = deltaE2000(PAINT_A, PAINT_B);
    expect(daylight).toBeCloseTo(2.29, 2);
    const verdict = assessPair({ a: { lab: PAINT_A, lrv: 76 }, b: { lab: PAINT_B, lrv: 78 }, intent: "match", accessRelevant: false }).verdict;
    for (const cct of LAMPS) {
      expect(deltaE2000(underLight(PAINT_A, cct), underLight(PAINT_B, cct))).toBeCloseTo(daylight, 9);
      const [check] = computeBoardChecks(
        [
          { id: "a", lab: PAINT_A, lrv: 76 },
          { id: "b", lab: PAINT_B, lrv: 78 },
        ],
        [{ id: "ab", itemAId: "a", itemBId: "b", intent: "match", accessRelevant: false }],
        cct,
        defaultThresholds,
      );
      expect(check?.verdict).toBe(verdict);
      expect(check?.daylight?.verdict).toBe(verdict);
      expect(check?.changed).toBe(false);
    }
  });

  it("never changes a ΔE00, contrast or LRV verdict on a board, over many pairs and every lamp [property]", () => {
    fc.assert(
      fc.property(fc.array(pairCase, { minLength: 1, maxLength: 8 }), (cases) => {
        const items = cases.flatMap((c, n) => [
          { id: `a${n}`, lab: c.a as Lab, lrv: c.lrvA },
          { id: `b${n}`, lab: c.b as Lab, lrv: c.lrvB },
        ]);
        const pairs = cases.map((c, n) => ({ id: `p${n}`, itemAId: `a${n}`, itemBId: `b${n}`, intent: c.intent, accessRelevant: c.accessRelevant }));
        const daylight = new Map(computeBoardChecks(items, pairs, 6504, defaultThresholds).map((c) => [c.pairId, c]));
        for (const cct of LAMPS) {
          for (const check of computeBoardChecks(items, pairs, cct, defaultThresholds)) {
            const before = daylight.get(check.pairId);
            expect([check.verdict, check.decidedBy, check.reason]).toEqual([before?.verdict, before?.decidedBy, before?.reason]);
            expect(check.deltaE).toBe(before?.deltaE);
            expect([check.contrastRatio, check.luminanceContrast, check.lrvA, check.lrvB]).toEqual([
              before?.contrastRatio,
              before?.luminanceContrast,
              before?.lrvA,
              before?.lrvB,
            ]);
            expect(check.changed).toBe(false);
          }
        }
      }),
      { numRuns: 300 },
    );
  });
});

describe("how far the eye adapts", () => {
  // [reference library: colorjs.io 0.7.1 cam16.js environment(), which computes CIECAM02/CAM16's D the same way]
  it("follows CIECAM02's degree of adaptation, as colorjs.io computes it", () => {
    for (const la of [5, 19.1, 64, 200, 318.31]) {
      const white: [number, number, number] = [0.9505, 1, 1.089];
      const env = environment(white, la, 20, "average", false);
      // dRgb = D × Yw/RGBw + 1 − D: recover D from the first cone channel.
      const row = M.cat16?.[0] ?? [];
      const rgbW = white.reduce((sum, v, i) => sum + v * 100 * (row[i] ?? 0), 0);
      const d = ((env.dRgb[0] ?? NaN) - 1) / (100 / rgbW - 1);
      expect(computeDegreeOfAdaptation(la)).toBeCloseTo(d, 9);
    }
  });

  it("is about 0.86 in a room at 300 lux (L_A ≈ 19 cd/m²) [published: CIE 159:2004 formula; the room is our assumption]", () => {
    expect(LAMP_ADAPTATION).toBeGreaterThan(0.85);
    expect(LAMP_ADAPTATION).toBeLessThan(0.87);
    // [memory: CIE 159:2004 worked example, L_A = 318.31 cd/m², F = 1, gives D ≈ 0.9945]
    expect(computeDegreeOfAdaptation(318.31)).toBeCloseTo(0.9945, 3);
  });
});
