import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { deltaE2000, parseColour } from "../../../lib/colour";
import type { Lab } from "../../../lib/colour";
import { analysePhoto, PhotoInputError } from "../../../lib/colour/photo";
import { createSeededRandom } from "./seeded-random";

type Rgb = [number, number, number];

// [published: IEC 61966-2-1 sRGB transfer functions]
const decode = (v: number): number => (v <= 0.04045 ? v / 12.92 : ((v + 0.055) / 1.055) ** 2.4);
const encode = (v: number): number => (v <= 0.0031308 ? v * 12.92 : 1.055 * v ** (1 / 2.4) - 0.055);

/** A PNG (lossless, so the pixels are exactly what we set) painted pixel by pixel. */
async function makePng(width: number, height: number, paint: (x: number, y: number) => Rgb): Promise<Buffer> {
  const raw = Buffer.alloc(width * height * 3);
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) raw.set(paint(x, y).map((v) => Math.round(Math.min(255, Math.max(0, v)))), (y * width + x) * 3);
  }
  return sharp(raw, { raw: { width, height, channels: 3 } }).png().toBuffer();
}

const labOf = (rgb: Rgb): Lab => parseColour(`rgb(${rgb.join(", ")})`);

describe("analysePhoto", () => {
  const sage: Rgb = [150, 160, 120];
  const terracotta: Rgb = [180, 95, 70];

  it("finds both colours of a 70/30 image with their shares [test construction: exact pixel counts]", async () => {
    const png = await makePng(100, 100, (_, y) => (y < 70 ? sage : terracotta));
    const { palette, representative, corrected } = await analysePhoto(png);
    expect(corrected).toBe(false);
    expect(palette).toHaveLength(2);
    expect(Math.abs((palette[0]?.share ?? 0) - 0.7)).toBeLessThan(0.05);
    expect(Math.abs((palette[1]?.share ?? 0) - 0.3)).toBeLessThan(0.05);
    expect(deltaE2000(palette[0]?.lab ?? [0, 0, 0], labOf(sage))).toBeLessThan(2);
    expect(deltaE2000(palette[1]?.lab ?? [0, 0, 0], labOf(terracotta))).toBeLessThan(2);
    expect(deltaE2000(representative, labOf(sage))).toBeLessThan(2);
  });

  it("ignores a few white specular spots [common practice: trimmed median resists glare]", async () => {
    const spots = [
      [20, 20],
      [70, 30],
      [40, 75],
    ];
    const png = await makePng(100, 100, (x, y) =>
      spots.some(([sx = 0, sy = 0]) => Math.abs(x - sx) < 3 && Math.abs(y - sy) < 3) ? [255, 255, 255] : sage,
    );
    const { representative, palette } = await analysePhoto(png);
    expect(deltaE2000(representative, labOf(sage))).toBeLessThan(1);
    expect(palette).toHaveLength(1); // the spots are under 3% of the area
    expect(palette[0]?.share).toBe(1);
  });

  it("reads the body colour of a veined stone, not the veins [common practice: median ignores a minority]", async () => {
    const stone: Rgb = [225, 222, 214];
    const vein: Rgb = [90, 90, 95];
    const png = await makePng(120, 120, (x, y) => (Math.abs(((x + 2 * y) % 40) - 20) < 2 ? vein : stone));
    const { representative } = await analysePhoto(png);
    expect(deltaE2000(representative, labOf(stone))).toBeLessThan(1);
  });

  describe("with a grey card", () => {
    // A 3000 K lamp's white in linear sRGB (from the Kim et al. 2002 Planckian locus through the sRGB
    // matrix), scaled to luminance 1 as a camera's auto-exposure would, multiplied into every pixel.
    // [published: Kim et al. 2002; IEC 61966-2-1]. Colours are chosen so no channel clips.
    const lamp: Rgb = [1.765, 0.845, 0.272];
    const grey: Rgb = [170, 170, 170];
    const card = { left: 10, top: 10, width: 30, height: 24 };
    // The card is rgb(170 170 170) under a lamp of luminance 1, so it reflects decode(170/255) = 40.2%.
    const withCard = { card: { box: card, reflectance: decode(170 / 255) } };
    const random = createSeededRandom(3000);
    const castPhoto = (truth: Rgb) =>
      makePng(160, 120, (x, y) => {
        const inCard = x >= card.left && x < card.left + card.width && y >= card.top && y < card.top + card.height;
        const base = inCard ? grey : truth;
        // Light sensor noise so the statistics have something to do.
        return base.map((v, i) => encode(decode(v / 255) * (lamp[i] ?? 1)) * 255 + (random() - 0.5) * 2) as Rgb;
      });

    it.each([
      ["sage", sage],
      ["terracotta", terracotta],
      ["stone", [190, 185, 175] as Rgb],
    ])("recovers %s within ΔE00 2 once the card is given, and is further off without it", async (_, truth) => {
      const png = await castPhoto(truth);
      const plain = await analysePhoto(png);
      const fixed = await analysePhoto(png, withCard);
      expect(fixed.corrected).toBe(true);
      const errorFixed = deltaE2000(fixed.representative, labOf(truth));
      const errorPlain = deltaE2000(plain.representative, labOf(truth));
      expect(errorFixed).toBeLessThan(2);
      expect(errorPlain).toBeGreaterThan(errorFixed + 5);
    });

    it("leaves the card itself out of the palette [project decision: the card is not the finish]", async () => {
      const fixed = await analysePhoto(await castPhoto(sage), withCard);
      expect(fixed.palette).toHaveLength(1);
    });

    it("reads the card box in the photo's displayed orientation (EXIF rotated) [published: EXIF 2.3 Orientation tag; project spec]", async () => {
      const png = await castPhoto(sage);
      // Stored rotated 90° anticlockwise with EXIF 6, so it displays exactly as the original.
      const stored = await sharp(png).rotate(-90).withMetadata({ orientation: 6 }).png().toBuffer();
      const fixed = await analysePhoto(stored, withCard);
      expect(deltaE2000(fixed.representative, labOf(sage))).toBeLessThan(2);
    });
  });

  it.each([
    { left: 150, top: 10, width: 30, height: 20 },
    { left: -1, top: 0, width: 10, height: 10 },
    { left: 0, top: 0, width: 0, height: 10 },
    { left: 0, top: 100, width: 10, height: 30 },
    { left: 0.5, top: 0, width: 10, height: 10 },
  ])("throws PhotoInputError for an unusable card box %j [project spec]", async (neutral) => {
    const png = await makePng(160, 120, () => sage);
    await expect(analysePhoto(png, { card: { box: neutral, reflectance: 0.18 } })).rejects.toThrow(PhotoInputError);
  });

  it("throws PhotoInputError for something that isn't an image [project spec]", async () => {
    await expect(analysePhoto(Buffer.from("not a photo"))).rejects.toThrow(PhotoInputError);
  });
});
