import Color from "colorjs.io";
import sharp from "sharp";
import { beforeAll, describe, expect, it } from "vitest";
import { deltaE2000, parseColour } from "@/lib/colour";
import type { Lab } from "@/lib/colour";
import { analysePhoto } from "@/lib/colour/photo";
import { processPhoto } from "@/lib/uploads/pipeline";
import {
  buildAdobeRgbProfile,
  computeColorantMatrix,
  decodeToLab,
  encodeLab,
  makeProfiledJpeg,
  makeProfiledPng,
  quantise,
  readBuiltInProfile,
  type Depth,
  type Encoding,
} from "@/tests/support/profiled-images";

/*
 * Every photo is measured through its embedded ICC profile, at 8 and 16 bits. Each file holds
 * exactly the device values colorjs.io gives for a known colour in that encoding; the expected
 * measurement is colorjs.io's CIELAB (D65) of those same (quantised) values.
 *
 * Tolerance, PNG: ΔE00 ≤ 1.0. What is left is rounding, not colour management: the file's values
 * are rounded to 8 bits before the profile is applied (16-bit files too: see openUpright), lcms
 * works through 8-bit tables there, and the result is rounded to 8-bit sRGB again; two roundings of
 * half a code value each per channel come to about 1 code value, which is ΔE00 0.3–0.8 on these
 * colours (0.77 the worst seen). The fault this guards against was ΔE00 2.5.
 * Tolerance, JPEG (quality 95, 4:4:4): ΔE00 ≤ 1.5, the same plus JPEG's own loss on a flat
 * colour (up to 1.0 seen). [test construction; colorjs.io 0.7 as the reference library]
 */
const PNG_TOLERANCE = 1;
const JPEG_TOLERANCE = 1.5;

const samples: [string, string][] = [
  ["oak", "#b08a5e"],
  ["warm white", "#d9d2c3"],
  ["navy", "#3d5a80"],
  ["terracotta", "#b5651d"],
  ["charcoal", "#2f2f2f"],
];

type Tagging = "untagged" | Encoding;
const profiles: Partial<Record<Tagging, Buffer>> = {};
beforeAll(async () => {
  profiles.srgb = await readBuiltInProfile("srgb");
  profiles.p3 = await readBuiltInProfile("p3");
  profiles.a98rgb = buildAdobeRgbProfile();
});

const encodingOf = (tagging: Tagging): Encoding => (tagging === "untagged" ? "srgb" : tagging);

/** A flat photo of `hex` as a camera set to `tagging` would write it, and what it should measure. */
async function makeCase(hex: string, tagging: Tagging, depth: Depth) {
  const encoding = encodingOf(tagging);
  const device = quantise(encodeLab(parseColour(hex), encoding), depth);
  const expected: Lab = decodeToLab(device, encoding);
  const png = await makeProfiledPng(80, 60, { depth, profile: profiles[tagging] }, () => device);
  return { png, expected, device };
}

describe("the Adobe RGB (1998) test profile", () => {
  it("has the colorant matrix colorjs.io uses for a98rgb, adapted to D50 [published: Adobe RGB (1998) primaries; reference library: colorjs.io]", () => {
    const ours = computeColorantMatrix(
      [
        [0.64, 0.33],
        [0.21, 0.71],
        [0.15, 0.06],
      ],
      [0.3127, 0.329],
    );
    for (let column = 0; column < 3; column++) {
      const unit = [0, 0, 0];
      unit[column] = 1;
      const reference = new Color("a98rgb-linear", unit as [number, number, number]).to("xyz-d50").coords;
      for (let row = 0; row < 3; row++) expect(ours[row]?.[column]).toBeCloseTo(Number(reference[row]), 3);
    }
  });

  it("is read by sharp as a profile [ICC.1:2001-04 header and tag layout]", async () => {
    const { png } = await makeCase("#b08a5e", "a98rgb", 8);
    const meta = await sharp(png).metadata();
    expect(meta.hasProfile).toBe(true);
    expect(meta.icc?.subarray(36, 40).toString("ascii")).toBe("acsp");
  });
});

describe("measuring through the embedded profile", () => {
  const taggings: Tagging[] = ["untagged", "srgb", "p3", "a98rgb"];
  const depths: Depth[] = [8, 16];
  const cases = taggings.flatMap((tagging) => depths.map((depth) => [tagging, depth] as const));

  it.each(cases)("a %s %i-bit PNG measures within ΔE00 1.0 of colorjs.io, in the engine and the upload pipeline", async (tagging, depth) => {
    for (const [, hex] of samples) {
      const { png, expected } = await makeCase(hex, tagging, depth);
      const direct = await analysePhoto(png);
      expect(deltaE2000(direct.representative, expected), `${hex} analysed`).toBeLessThanOrEqual(PNG_TOLERANCE);
      const processed = await processPhoto(png, "png");
      expect(deltaE2000(processed.analysis?.representative ?? [0, 0, 0], expected), `${hex} uploaded`).toBeLessThanOrEqual(PNG_TOLERANCE);
      // The stored original is what a re-measure reads: it must hold sRGB (untagged), not the camera's numbers.
      const stored = await analysePhoto(processed.original);
      expect(deltaE2000(stored.representative, expected), `${hex} stored`).toBeLessThanOrEqual(PNG_TOLERANCE);
      expect((await sharp(processed.original).metadata()).hasProfile).toBe(false);
    }
  });

  it.each(["untagged", "srgb", "p3", "a98rgb"] as const)("a %s JPEG measures within ΔE00 1.5 of colorjs.io", async (tagging) => {
    for (const [, hex] of samples) {
      const encoding = encodingOf(tagging);
      const device = quantise(encodeLab(parseColour(hex), encoding), 8);
      const jpeg = await makeProfiledJpeg(80, 64, profiles[tagging], () => device);
      const processed = await processPhoto(jpeg, "jpeg");
      expect(deltaE2000(processed.analysis?.representative ?? [0, 0, 0], decodeToLab(device, encoding)), hex).toBeLessThanOrEqual(JPEG_TOLERANCE);
    }
  });

  it("really depends on the profile: the same P3 and Adobe RGB numbers read as sRGB are well off [test construction: the check can fail]", async () => {
    for (const tagging of ["p3", "a98rgb"] as const) {
      const { device, expected } = await makeCase("#b08a5e", tagging, 16);
      const untagged = await makeProfiledPng(80, 60, { depth: 16 }, () => device);
      const misread = await analysePhoto(untagged);
      expect(deltaE2000(misread.representative, expected)).toBeGreaterThan(2);
    }
  });
});
