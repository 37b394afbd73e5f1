import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { POST as measure } from "@/app/api/uploads/[imageId]/measure/route";
import { POST as upload } from "@/app/api/uploads/route";
import { deltaE2000, lightReflectance, parseColour } from "@/lib/colour";
import type { Lab } from "@/lib/colour";
import { call, countRows, fileForm, listUploads } from "@/tests/support/library";
import { decodeToLab, encodeLab, makeProfiledPng, quantise, readBuiltInProfile } from "@/tests/support/profiled-images";

// [published: IEC 61966-2-1 sRGB transfer functions]
const decode = (v: number): number => (v <= 0.04045 ? v / 12.92 : ((v + 0.055) / 1.055) ** 2.4);
const encode = (v: number): number => (v <= 0.0031308 ? v * 12.92 : 1.055 * v ** (1 / 2.4) - 0.055);

type Body = {
  id: string;
  measured?: boolean;
  notMeasured?: string;
  colour?: { lab: Lab; lrv: number };
  corrected?: boolean;
  cardReflectance?: number | null;
  likelyError?: { lrv: number; deltaE: number };
};

const uploadPng = async (png: Buffer) => {
  const res = await call("designer", upload, "/api/uploads", { method: "POST", form: fileForm(png, "sample.png", "image/png") });
  expect(res.status).toBe(201);
  return res.body as Body;
};
const measureAs = (imageId: string, json: unknown) =>
  call("designer", measure, `/api/uploads/${imageId}/measure`, { method: "POST", json, params: { imageId } });

const oakHex = "#b08a5e";
const box = { left: 10, top: 10, width: 30, height: 24 };

/** Oak beside an 18% grey card, shot by an ideal linear camera at an exposure. */
async function shootOak(exposure: number): Promise<Buffer> {
  const width = 160;
  const height = 120;
  const oak = [0xb0, 0x8a, 0x5e].map((v) => decode(v / 255));
  const raw = Buffer.alloc(width * height * 3);
  for (let i = 0; i < width * height; i++) {
    const x = i % width;
    const y = Math.floor(i / width);
    const inCard = x >= box.left && x < box.left + box.width && y >= box.top && y < box.top + box.height;
    (inCard ? [0.18, 0.18, 0.18] : oak).forEach((v, c) => (raw[i * 3 + c] = Math.round(Math.min(1, encode(v * exposure)) * 255)));
  }
  return sharp(raw, { raw: { width, height, channels: 3 } }).png().toBuffer();
}

describe("photo measurement through the routes", () => {
  it("measures and stores a 16-bit Display P3 PNG through its profile [reference library: colorjs.io; tolerance as tests/unit/colour/photo-profiles.test.ts]", async () => {
    const device = quantise(encodeLab(parseColour(oakHex), "p3"), 16);
    const png = await makeProfiledPng(96, 64, { depth: 16, profile: await readBuiltInProfile("p3") }, () => device);
    const uploaded = await uploadPng(png);
    expect(uploaded.measured).toBe(true);
    expect(deltaE2000(uploaded.colour?.lab ?? [0, 0, 0], decodeToLab(device, "p3"))).toBeLessThanOrEqual(1);
    // Re-measuring reads the stored original: it must give the same colour, not the camera's numbers.
    const again = await measureAs(uploaded.id, {});
    expect(again.status).toBe(200);
    expect(deltaE2000((again.body as Body).colour?.lab ?? [0, 0, 0], decodeToLab(device, "p3"))).toBeLessThanOrEqual(1);
  });

  it("reads the same LRV at ±30% exposure once the 18% card is given, and says how far off it may be [test construction: ±0.5 LRV]", async () => {
    const truth = lightReflectance(parseColour(oakHex));
    for (const exposure of [0.7, 1.3]) {
      const uploaded = await uploadPng(await shootOak(exposure));
      expect(uploaded.corrected).toBe(false);
      expect(uploaded.likelyError?.lrv).toBeGreaterThanOrEqual(6); // no card: ±30% of the LRV
      const res = await measureAs(uploaded.id, { neutral: box, reflectance: 18 });
      expect(res.status).toBe(200);
      const body = res.body as Body;
      expect(body.corrected).toBe(true);
      expect(body.cardReflectance).toBe(18);
      expect(Math.abs((body.colour?.lrv ?? 0) - truth)).toBeLessThan(0.5);
      expect(body.likelyError).toEqual({ lrv: 3, deltaE: 2 });
    }
  });

  it("keeps a blown-out photo but measures nothing, saying why; re-measuring it is refused with 422 and no correction claimed [project rule]", async () => {
    const blown = await sharp({ create: { width: 120, height: 80, channels: 3, background: "#fffff0" } }).png().toBuffer();
    const files = listUploads().length;
    const uploaded = await uploadPng(blown);
    expect(uploaded.measured).toBe(false);
    expect(uploaded.colour).toBeUndefined();
    expect(uploaded.corrected).toBeUndefined();
    expect(uploaded.notMeasured).toMatch(/Too much of this photo is blown out to measure its colour.*less light/);
    expect(listUploads().length).toBe(files + 3);
    expect(await countRows("image", `id = '${uploaded.id}'`)).toBe(1);
    const again = await measureAs(uploaded.id, { neutral: box, reflectance: 18 });
    expect(again.status).toBe(422);
    expect(again.body.error).toMatch(/blown out/);
    expect(again.body.corrected).toBeUndefined();
  });

  it.each([
    [{ neutral: box }, "reflectance"],
    [{ neutral: box, reflectance: 1 }, "reflectance"],
    [{ neutral: box, reflectance: 99 }, "reflectance"],
    [{ neutral: box, reflectance: "18%" }, "reflectance"],
    [{ reflectance: 18 }, "neutral"],
  ])("refuses %j with 400 on %s [project rule: 2–98 per cent]", async (json, field) => {
    const uploaded = await uploadPng(await shootOak(1));
    const res = await measureAs(uploaded.id, json);
    expect(res.status).toBe(400);
    expect(Object.keys((res.body.fieldErrors as Record<string, unknown>) ?? {})).toContain(field);
  });
});
