import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { deltaE2000, lightReflectance, parseColour } from "@/lib/colour";
import { analysePhoto, MAX_CLIPPED_SHARE, PhotoNotMeasurableError } from "@/lib/colour/photo";
import { processPhoto } from "@/lib/uploads/pipeline";

type Rgb = [number, number, number];

// [published: IEC 61966-2-1 sRGB transfer functions]
const decode = (v: number): number => (v <= 0.04045 ? v / 12.92 : ((v + 0.055) / 1.055) ** 2.4);
const encode = (v: number): number => (v <= 0.0031308 ? v * 12.92 : 1.055 * v ** (1 / 2.4) - 0.055);

const oakHex = "#b08a5e";
const oak = [0xb0, 0x8a, 0x5e].map((v) => decode(v / 255)) as Rgb;
const box = { left: 10, top: 10, width: 30, height: 24 };
const inBox = (x: number, y: number) => x >= box.left && x < box.left + box.width && y >= box.top && y < box.top + box.height;

/**
 * The camera as a linear sensor: scene linear RGB × lamp × exposure, then the sRGB curve and
 * 8 bits, clipped at 255 as a sensor saturates. The card is a neutral of the given reflectance.
 */
async function shoot(finish: Rgb, options: { exposure: number; card?: number; lamp?: Rgb; finishShare?: (x: number, y: number) => boolean }): Promise<Buffer> {
  const width = 160;
  const height = 120;
  const lamp = options.lamp ?? [1, 1, 1];
  const raw = Buffer.alloc(width * height * 3);
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) {
      const card = options.card !== undefined && inBox(x, y);
      const base: Rgb = card ? [options.card ?? 0, options.card ?? 0, options.card ?? 0] : finish;
      base.forEach((v, c) => (raw[(y * width + x) * 3 + c] = Math.round(Math.min(1, encode(v * (lamp[c] ?? 1) * options.exposure)) * 255)));
    }
  }
  return sharp(raw, { raw: { width, height, channels: 3 } }).png().toBuffer();
}

describe("a grey card fixes exposure as well as cast", () => {
  const truthLrv = lightReflectance(parseColour(oakHex)); // CIE Y × 100 [published: LRV = CIE Y, BS 8493 as quoted by LRV explainers]

  /*
   * Tolerance ±0.5 LRV: the generated photos are an ideal linear camera, so all that differs
   * between exposures is 8-bit rounding of the card and the finish (half a code value is under
   * 0.8% of Y at these levels: 0.2 LRV at 28) plus resampling; 0.5 leaves room for both. The fault
   * was 20 / 28 / 37. [test construction]
   */
  it.each([0.7, 1, 1.3])("reads the same oak LRV at exposure ×%s with an 18 per cent grey card, and its colour within ΔE00 1", async (exposure) => {
    const png = await shoot(oak, { exposure, card: 0.18 });
    const fixed = await analysePhoto(png, { card: { box, reflectance: 0.18 } });
    expect(fixed.corrected).toBe(true);
    expect(fixed.reflectance).toBe(0.18);
    expect(Math.abs(lightReflectance(fixed.representative) - truthLrv)).toBeLessThan(0.5);
    expect(deltaE2000(fixed.representative, parseColour(oakHex))).toBeLessThan(1);
  });

  it("without the card the same three photos read far apart (the fault, reproduced) [test construction]", async () => {
    const lrvs = await Promise.all([0.7, 1.3].map(async (exposure) => lightReflectance((await analysePhoto(await shoot(oak, { exposure }))).representative)));
    expect((lrvs[1] ?? 0) - (lrvs[0] ?? 0)).toBeGreaterThan(12);
  });

  it("also works from a 90% white card, under a warm lamp and 30% under-exposed [common practice: white cards ≈ 90%]", async () => {
    // A mild warm cast (linear gains), kept small enough that the white card stays below clipping.
    const png = await shoot(oak, { exposure: 0.7, card: 0.9, lamp: [1.25, 1, 0.7] });
    const fixed = await analysePhoto(png, { card: { box, reflectance: 0.9 } });
    expect(Math.abs(lightReflectance(fixed.representative) - truthLrv)).toBeLessThan(0.5);
    expect(deltaE2000(fixed.representative, parseColour(oakHex))).toBeLessThan(1);
  });

  it("trusts the reflectance it is told: calling an 18% card 36% doubles the LRV [test construction: exposure really follows the card]", async () => {
    const png = await shoot(oak, { exposure: 1, card: 0.18 });
    const wrong = await analysePhoto(png, { card: { box, reflectance: 0.36 } });
    expect(lightReflectance(wrong.representative) / truthLrv).toBeCloseTo(2, 1);
  });
});

describe("clipped photos are not measured", () => {
  const blownAt = (share: number) => (x: number, y: number) => y * 160 + x < share * 160 * 120;

  async function paint(share: number, clip: Rgb, card = false): Promise<Buffer> {
    const width = 160;
    const height = 120;
    const raw = Buffer.alloc(width * height * 3);
    const ground: Rgb = [176, 138, 94];
    for (let y = 0; y < height; y++) {
      for (let x = 0; x < width; x++) {
        const value = card && inBox(x, y) ? [118, 118, 118] : blownAt(share)(x, y) ? clip : ground;
        raw.set(value, (y * width + x) * 3);
      }
    }
    return sharp(raw, { raw: { width, height, channels: 3 } }).png().toBuffer();
  }

  it("refuses a finish mostly at full white, says why and what to do, and claims no correction [project rule]", async () => {
    const png = await paint(0.6, [255, 255, 240]);
    await expect(analysePhoto(png)).rejects.toThrow(PhotoNotMeasurableError);
    await expect(analysePhoto(png)).rejects.toThrow(/Too much of this photo is blown out to measure its colour.*take it again with less light/);
    // With a card it is refused all the same: `corrected` is never reached.
    await expect(analysePhoto(await paint(0.6, [255, 255, 240], true), { card: { box, reflectance: 0.18 } })).rejects.toThrow(/blown out/);
  });

  it("refuses a finish mostly crushed to black, asking for more light [project rule]", async () => {
    await expect(analysePhoto(await paint(0.5, [0, 12, 20]))).rejects.toThrow(/crushed to black.*take it again with more light/);
  });

  it(`measures a photo with a little glare (under ${MAX_CLIPPED_SHARE * 100}% clipped) as before [project rule: the 5% trim absorbs it]`, async () => {
    const result = await analysePhoto(await paint(0.04, [255, 255, 255]));
    expect(deltaE2000(result.representative, parseColour(oakHex))).toBeLessThan(1);
  });

  it("counts only the finish: a white card taking 40% of the photo is not 'blown out' [project rule]", async () => {
    const width = 160;
    const height = 120;
    const big = { left: 0, top: 0, width: 100, height: 80 };
    const raw = Buffer.alloc(width * height * 3);
    for (let i = 0; i < width * height; i++) {
      const x = i % width;
      const y = Math.floor(i / width);
      raw.set(x < big.width && y < big.height ? [230, 230, 230] : [176, 138, 94], i * 3);
    }
    const png = await sharp(raw, { raw: { width, height, channels: 3 } }).png().toBuffer();
    const result = await analysePhoto(png, { card: { box: big, reflectance: 0.79 } });
    expect(result.corrected).toBe(true);
  });

  it("refuses a card that is itself blown out [project rule]", async () => {
    const png = await paint(0, [0, 0, 0], false);
    const withWhiteCard = await sharp(png).composite([{ input: { create: { width: 30, height: 24, channels: 3, background: "#ffffff" } }, left: box.left, top: box.top }]).png().toBuffer();
    await expect(analysePhoto(withWhiteCard, { card: { box, reflectance: 0.9 } })).rejects.toThrow(/Too much of the card is blown out/);
  });

  it("an upload keeps a clipped photo but answers no measurement, with the reason [project rule]", async () => {
    const processed = await processPhoto(await paint(0.6, [255, 255, 255]), "png");
    expect(processed.analysis).toBeNull();
    expect(processed.notMeasured).toMatch(/blown out/);
    expect(processed.original.length).toBeGreaterThan(0);
  });
});
