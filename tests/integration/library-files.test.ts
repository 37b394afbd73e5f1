import sharp from "sharp";
import { beforeAll, describe, expect, it } from "vitest";
import { PATCH as patchOne } from "@/app/api/finishes/[finishId]/route";
import { GET as serve } from "@/app/api/uploads/[imageId]/[variant]/route";
import { POST as measure } from "@/app/api/uploads/[imageId]/measure/route";
import { POST as upload } from "@/app/api/uploads/route";
import { deltaE2000, parseColour } from "@/lib/colour";
import type { Persona } from "@/tests/support/session";
import { call, fileForm, makeJpegWithGps } from "@/tests/support/library";

const uploadPhoto = async (persona: Persona, bytes: Uint8Array, name = "sample.jpg", type = "image/jpeg") => {
  const res = await call(persona, upload, "/api/uploads", { method: "POST", form: fileForm(bytes, name, type) });
  expect(res.status).toBe(201);
  return res.body as { id: string; width: number; height: number };
};

const attach = (finishKey: string, imageId: string) =>
  call("designer", patchOne, `/api/finishes/demo-finish-${finishKey}`, { method: "PATCH", json: { imageId }, params: { finishId: `demo-finish-${finishKey}` } });

const fetchAs = (persona: Persona, imageId: string, variant = "400") =>
  call(persona, serve, `/api/uploads/${imageId}/${variant}`, { params: { imageId, variant } });

let saltbushPhoto: string; // on the board, an option and a spec line addressed to the stone supplier
let oatPhoto: string; // on the board and options only
let loosePhoto: string; // uploaded, never attached

beforeAll(async () => {
  const jpeg = await makeJpegWithGps();
  saltbushPhoto = (await uploadPhoto("designer", jpeg)).id;
  oatPhoto = (await uploadPhoto("designer", jpeg)).id;
  loosePhoto = (await uploadPhoto("owner", jpeg)).id;
  expect((await attach("saltbush", saltbushPhoto)).status).toBe(200);
  expect((await attach("cab-oat", oatPhoto)).status).toBe(200);
});

describe("GET /api/uploads/:id/:variant", () => {
  it("serves each variant as an image that can't be run: image type, nosniff, inline", async () => {
    for (const [variant, type] of [["original", "image/jpeg"], ["1600", "image/webp"], ["400", "image/webp"]] as const) {
      const res = await fetchAs("designer", saltbushPhoto, variant);
      expect(res.status).toBe(200);
      expect(res.headers.get("content-type")).toBe(type);
      expect(res.headers.get("x-content-type-options")).toBe("nosniff");
      expect(res.headers.get("content-disposition")).toBe("inline");
      expect(res.headers.get("cache-control")).toMatch(/^private/);
      expect((await sharp(res.bytes).metadata()).format).toBe(variant === "original" ? "jpeg" : "webp");
    }
  });

  it.each<[Persona, string, number]>([
    ["owner", "saltbush", 200],
    ["designer", "saltbush", 200],
    ["other", "saltbush", 404],
    ["client", "saltbush", 200],
    ["client2", "saltbush", 200],
    ["stone", "saltbush", 200],
    ["joinery", "saltbush", 404],
    ["anonymous", "saltbush", 401],
    ["client", "oat", 200],
    ["stone", "oat", 404],
    ["joinery", "oat", 404],
    ["client", "loose", 404],
    ["owner", "loose", 200],
    ["other", "loose", 404],
  ])("answers %s asking for the %s photo with %i", async (persona, which, status) => {
    const id = which === "saltbush" ? saltbushPhoto : which === "oat" ? oatPhoto : loosePhoto;
    const res = await fetchAs(persona, id);
    expect(res.status).toBe(status);
    if (status !== 200) expect(res.headers.get("content-type")).toMatch(/json/);
  });

  it("answers 404 for a variant or an id that isn't there", async () => {
    expect((await fetchAs("designer", saltbushPhoto, "800")).status).toBe(404);
    expect((await fetchAs("designer", saltbushPhoto, "..%2F..%2Fetc%2Fpasswd")).status).toBe(404);
    expect((await fetchAs("designer", "no-such-image")).status).toBe(404);
  });

  it("stops serving a client once their project no longer uses the finish", async () => {
    expect((await fetchAs("client", oatPhoto)).status).toBe(200);
    await attach("cab-oat", loosePhoto);
    expect((await fetchAs("client", oatPhoto)).status).toBe(404);
  });
});

describe("POST /api/uploads/:id/measure", () => {
  // A 3000 K lamp's white in linear sRGB, as in tests/unit/colour/photo.test.ts [published: Kim et
  // al. 2002 Planckian locus; IEC 61966-2-1], over a mid-grey card and a sage finish.
  const lamp = [1.765, 0.845, 0.272];
  const decode = (v: number) => (v <= 0.04045 ? v / 12.92 : ((v + 0.055) / 1.055) ** 2.4);
  const encode = (v: number) => (v <= 0.0031308 ? v * 12.92 : 1.055 * v ** (1 / 2.4) - 0.055);
  const sage = [150, 160, 120];
  const card = { left: 8, top: 8, width: 40, height: 30 };

  async function castPhoto(): Promise<Buffer> {
    const width = 160;
    const height = 120;
    const raw = Buffer.alloc(width * height * 3);
    for (let y = 0; y < height; y++) {
      for (let x = 0; x < width; x++) {
        const inCard = x >= card.left && x < card.left + card.width && y >= card.top && y < card.top + card.height;
        const base = inCard ? [170, 170, 170] : sage;
        raw.set(base.map((v, i) => Math.round(Math.min(1, encode(decode(v / 255) * (lamp[i] ?? 1))) * 255)), (y * width + x) * 3);
      }
    }
    return sharp(raw, { raw: { width, height, channels: 3 } }).png().toBuffer();
  }

  const measureAs = (persona: Persona, imageId: string, json: unknown) =>
    call(persona, measure, `/api/uploads/${imageId}/measure`, { method: "POST", json, params: { imageId } });

  it("removes the lamp's cast when the designer boxes the grey card", async () => {
    const photo = await uploadPhoto("designer", await castPhoto(), "warm light.png", "image/png");
    const truth = parseColour(`rgb(${sage.join(", ")})`);
    const plain = await measureAs("designer", photo.id, {});
    // The card is rgb(170 170 170) under a lamp scaled to luminance 1: it reflects decode(170/255) = 40.2% [IEC 61966-2-1].
    const corrected = await measureAs("designer", photo.id, { neutral: card, reflectance: 100 * decode(170 / 255) });
    expect(corrected.status).toBe(200);
    expect(corrected.body.corrected).toBe(true);
    const plainLab = (plain.body.colour as { lab: [number, number, number] }).lab;
    const fixedLab = (corrected.body.colour as { lab: [number, number, number] }).lab;
    expect(deltaE2000(plainLab, truth)).toBeGreaterThan(10);
    // The engine's own test holds the corrected colour within 1.5 ΔE00 for this cast [tests/unit/colour/photo.test.ts].
    expect(deltaE2000(fixedLab, truth)).toBeLessThan(1.5);
  });

  it("answers 422 for a box outside the photo and 400 for one that isn't a box", async () => {
    const outside = await measureAs("designer", loosePhoto, { neutral: { left: 500, top: 0, width: 10, height: 10 }, reflectance: 18 });
    expect(outside.status).toBe(422);
    expect(outside.body.error).toMatch(/runs outside/);
    expect((await measureAs("designer", loosePhoto, { neutral: { left: "a" } })).status).toBe(400);
  });

  it.each<[Persona, number]>([
    ["owner", 200],
    ["other", 404],
    ["client", 403],
    ["stone", 403],
    ["anonymous", 401],
  ])("answers %s with %i", async (persona, status) => {
    expect((await measureAs(persona, loosePhoto, {})).status).toBe(status);
  });
});
