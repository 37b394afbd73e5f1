import { readFileSync } from "node:fs";
import path from "node:path";
import { crc32 } from "node:zlib";
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { POST as upload } from "@/app/api/uploads/route";
import { deltaE2000, parseColour } from "@/lib/colour";
import { call, countRows, fileForm, listUploads, makeFlatImage, makeJpegWithGps } from "@/tests/support/library";

const uploadAs = (persona: Parameters<typeof call>[0], bytes: Uint8Array, name: string, type: string) =>
  call(persona, upload, "/api/uploads", { method: "POST", form: fileForm(bytes, name, type) });

/** A refused upload must leave the uploads folder and the image table exactly as they were. */
async function expectRefused(bytes: Uint8Array, name: string, type: string, status: number, message: RegExp) {
  const files = listUploads();
  const rows = await countRows("image");
  const res = await uploadAs("designer", bytes, name, type);
  expect(res.status).toBe(status);
  expect(res.body.error).toMatch(message);
  expect(listUploads()).toEqual(files);
  expect(await countRows("image")).toBe(rows);
}

function chunk(type: string, data: Buffer): Buffer {
  const head = Buffer.alloc(8);
  head.writeUInt32BE(data.length, 0);
  head.write(type, 4, "ascii");
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(Buffer.concat([Buffer.from(type, "ascii"), data])) >>> 0, 0);
  return Buffer.concat([head, data, crc]);
}

/** A valid PNG header claiming 10,000 × 10,000 px (100 MP) with almost no data: costs nothing to send. */
function makeHugePixelPng(): Buffer {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(10_000, 0);
  ihdr.writeUInt32BE(10_000, 4);
  ihdr.set([8, 0, 0, 0, 0], 8); // 8-bit greyscale [published: PNG specification, IHDR]
  const signature = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
  return Buffer.concat([signature, chunk("IHDR", ihdr), chunk("IDAT", Buffer.from([0x78, 0x9c, 0x03, 0x00, 0x00, 0x00, 0x00, 0x01])), chunk("IEND", Buffer.alloc(0))]);
}

describe("POST /api/uploads with real photos", () => {
  it("stores a JPEG upright, without its EXIF or GPS, under generated names, and measures it", async () => {
    const jpeg = await makeJpegWithGps(96, 64);
    const before = await sharp(jpeg).metadata();
    // The input really carries what must go: EXIF with a GPS block (tag 0x8825) and orientation 6.
    expect(before.exif?.includes(Buffer.from("mottle-exif-marker"))).toBe(true);
    expect(before.exif?.indexOf(Buffer.from([0x25, 0x88]))).toBeGreaterThan(0);
    expect(before.orientation).toBe(6);

    const files = listUploads();
    const res = await uploadAs("designer", jpeg, "IMG_2041 site visit.jpg", "image/jpeg");
    expect(res.status).toBe(201);
    const body = res.body as { id: string; url: string; thumbUrl: string; width: number; height: number; colour: { hex: string; lab: number[]; lrv: number }; palette: { hex: string; share: number }[] };
    expect(body.url).toBe(`/api/uploads/${body.id}/1600`);
    expect(body.thumbUrl).toBe(`/api/uploads/${body.id}/400`);
    // Orientation 6 turns a 96 × 64 landscape into a 64 × 96 portrait [published: EXIF 2.3, Orientation tag].
    expect([body.width, body.height]).toEqual([64, 96]);
    expect(body.colour.hex).toMatch(/^#[0-9a-f]{6}$/);
    expect(body.palette.length).toBeGreaterThanOrEqual(1);
    // The ground is rgb(150 160 120); JPEG and the band move the median only a little. [test construction]
    expect(deltaE2000(body.colour.lab as [number, number, number], parseColour("rgb(150, 160, 120)"))).toBeLessThan(3);

    const added = listUploads().filter((f) => !files.includes(f));
    expect(added).toHaveLength(3);
    const uuid = "[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}";
    expect(added.every((f) => new RegExp(`^${uuid}(-400\\.webp|-1600\\.webp|\\.jpg)$`).test(f))).toBe(true);
    expect(added.some((f) => f.includes("IMG"))).toBe(false);
    for (const name of added) {
      const stored = readFileSync(path.join(process.env.UPLOADS_DIR ?? "", name));
      const meta = await sharp(stored).metadata();
      expect(meta.exif).toBeUndefined();
      expect(meta.xmp).toBeUndefined();
      expect(meta.iptc).toBeUndefined();
      expect(stored.includes(Buffer.from("mottle-exif-marker"))).toBe(false);
      expect(meta.orientation ?? 1).toBe(1);
      expect(meta.height).toBeGreaterThan(meta.width ?? 0);
    }
    expect(await countRows("image", `id = '${body.id}'`)).toBe(1);
    expect(await countRows("audit_log", `action = 'image.uploaded' and entity_id = '${body.id}'`)).toBe(1);
  });

  it.each([
    ["png", "image/png", "#b5651d"],
    ["webp", "image/webp", "#6f8fa8"],
    ["avif", "image/avif", "#d9d2c3"],
  ] as const)("takes a %s and measures its flat colour", async (format, type, hex) => {
    const bytes = await makeFlatImage(format, hex);
    const files = listUploads();
    const res = await uploadAs("owner", bytes, `sample.${format}`, type);
    expect(res.status).toBe(201);
    const colour = (res.body.colour as { lab: [number, number, number] }).lab;
    // Lossy WebP/AVIF move a flat colour by well under 2 ΔE00 [common practice, checked here].
    expect(deltaE2000(colour, parseColour(hex))).toBeLessThan(2);
    // The original keeps its own format (re-encoded); the previews are WebP.
    const added = listUploads().filter((f) => !files.includes(f));
    const originals = added.filter((f) => !/-(400|1600)\.webp$/.test(f));
    expect(originals).toHaveLength(1);
    expect(originals[0]).toMatch(new RegExp(`\\.${format}$`));
    expect(added).toHaveLength(3);
  });

  it("keeps another studio's upload in that studio", async () => {
    const res = await uploadAs("other", await makeFlatImage("png", "#808080"), "grey.png", "image/png");
    expect(res.status).toBe(201);
    expect(await countRows("image", `id = '${String(res.body.id)}' and studio_id = 'demo-studio-northwall'`)).toBe(1);
  });

  it.each([
    ["client", 403],
    ["stone", 403],
    ["anonymous", 401],
  ] as const)("refuses %s with %i and writes nothing", async (persona, status) => {
    const files = listUploads();
    const res = await uploadAs(persona, await makeFlatImage("png", "#808080"), "grey.png", "image/png");
    expect(res.status).toBe(status);
    expect(listUploads()).toEqual(files);
  });
});

describe("POST /api/uploads with hostile files: refused, nothing written", () => {
  it("a truncated JPEG → 422", async () => {
    const whole = await sharp({ create: { width: 400, height: 300, channels: 3, background: "#a08a70" } }).jpeg().toBuffer();
    await expectRefused(whole.subarray(0, Math.floor(whole.length * 0.6)), "cut.jpg", "image/jpeg", 422, /damaged or cut short/);
  });

  it("a text file named .png → 415", async () => {
    await expectRefused(Buffer.from("just some notes, not a picture\n"), "notes.png", "image/png", 415, /isn't one/);
  });

  it("an SVG (which can carry script) → 415, however it is named", async () => {
    const svg = Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"><script>alert(1)</script><rect width="10" height="10"/></svg>');
    await expectRefused(svg, "swatch.svg", "image/svg+xml", 415, /isn't a photo we can use/);
    await expectRefused(svg, "swatch.png", "image/png", 415, /isn't one/);
  });

  it("a PNG claiming 100 megapixels → 422 before decoding", async () => {
    await expectRefused(makeHugePixelPng(), "huge.png", "image/png", 422, /more than 50 megapixels/);
  });

  it("a path-traversal file name → 422, even on a good photo", async () => {
    const png = await makeFlatImage("png", "#808080");
    await expectRefused(png, "../../../etc/cron.d/evil.png", "image/png", 422, /file name can't be used/);
    await expectRefused(png, "..\\..\\evil.png", "image/png", 422, /file name can't be used/);
  });

  it("a file over 15 MB → 413", async () => {
    const big = Buffer.alloc(15 * 1024 * 1024 + 1);
    big.set([0xff, 0xd8, 0xff, 0xe0]);
    await expectRefused(big, "big.jpg", "image/jpeg", 413, /larger than 15 MB/);
  });

  it("a PNG sent as a JPEG → 415 (declared and real type must agree)", async () => {
    await expectRefused(await makeFlatImage("png", "#808080"), "grey.jpg", "image/jpeg", 415, /really a PNG/);
  });

  it("a request without a file → 400", async () => {
    const res = await call("designer", upload, "/api/uploads", { method: "POST", form: new FormData() });
    expect(res.status).toBe(400);
    expect(res.body.fieldErrors).toEqual({ file: ["Choose a photo to upload."] });
  });
});
