import { deflateSync, crc32 } from "node:zlib";
import Color from "colorjs.io";
import sharp from "sharp";
import type { Lab } from "@/lib/colour";

/**
 * Test images whose pixels are exactly what we write, in a stated RGB encoding, with an ICC
 * profile attached byte for byte (no conversion by sharp on the way in). The expected colour of
 * every pixel is then computed independently, with colorjs.io, from the same device values.
 */

export type Encoding = "srgb" | "p3" | "a98rgb";
export type Depth = 8 | 16;
export type Rgb = [number, number, number];

/** colorjs.io's names for the spaces [reference library: colorjs.io 0.7 space ids]. */
const spaceIds: Record<Encoding, string> = { srgb: "srgb", p3: "p3", a98rgb: "a98rgb" };

/** Device values (0–1) of a CIELAB (D65) colour in an encoding, unclipped. */
export function encodeLab(lab: Lab, encoding: Encoding): Rgb {
  const coords = new Color("lab-d65", [...lab]).to(spaceIds[encoding]).coords;
  return coords.map((v) => Number(v)) as Rgb;
}

/** CIELAB (D65) of device values in an encoding: what a faithful measurement should find. */
export function decodeToLab(rgb: Rgb, encoding: Encoding): Lab {
  const coords = new Color(spaceIds[encoding], [...rgb]).to("lab-d65").coords;
  return coords.map((v) => Number(v)) as unknown as Lab;
}

/** The nearest code value at a bit depth, as a fraction again (what the file really holds). */
export function quantise(rgb: Rgb, depth: Depth): Rgb {
  const max = depth === 8 ? 255 : 65535;
  return rgb.map((v) => Math.round(Math.min(1, Math.max(0, v)) * max) / max) as Rgb;
}

// ---- ICC profiles -------------------------------------------------------------------------

/** The bytes of one of sharp's (libvips') built-in profiles, read back from an image it tagged. */
export async function readBuiltInProfile(name: "srgb" | "p3"): Promise<Buffer> {
  const tagged = await sharp({ create: { width: 1, height: 1, channels: 3, background: "#808080" } })
    .png()
    .withIccProfile(name)
    .toBuffer();
  const { icc } = await sharp(tagged).metadata();
  if (!icc) throw new Error(`sharp attached no ${name} profile`);
  return icc;
}

const s15 = (v: number) => Math.round(v * 65536);

function xyzTag(xyz: readonly number[]): Buffer {
  const tag = Buffer.alloc(20);
  tag.write("XYZ ", 0, "ascii");
  xyz.forEach((v, i) => tag.writeInt32BE(s15(v), 8 + 4 * i));
  return tag;
}

function gammaTag(gamma: number): Buffer {
  const tag = Buffer.alloc(14);
  tag.write("curv", 0, "ascii");
  tag.writeUInt32BE(1, 8);
  tag.writeUInt16BE(Math.round(gamma * 256), 12); // u8Fixed8Number [ICC.1:2001-04 §6.5.3]
  return tag;
}

function textDescriptionTag(text: string): Buffer {
  // textDescriptionType [ICC.1:2001-04 §6.5.17]: ASCII part, empty Unicode and ScriptCode parts.
  const ascii = Buffer.from(`${text}\0`, "ascii");
  const tag = Buffer.alloc(12 + ascii.length + 8 + 3 + 67);
  tag.write("desc", 0, "ascii");
  tag.writeUInt32BE(ascii.length, 8);
  ascii.copy(tag, 12);
  return tag;
}

function textTag(text: string): Buffer {
  const ascii = Buffer.from(`${text}\0`, "ascii");
  const tag = Buffer.alloc(8 + ascii.length);
  tag.write("text", 0, "ascii");
  ascii.copy(tag, 8);
  return tag;
}

const pad4 = (b: Buffer) => (b.length % 4 === 0 ? b : Buffer.concat([b, Buffer.alloc(4 - (b.length % 4))]));

type M3 = number[][];
const multiply = (a: M3, b: M3): M3 => a.map((row) => b[0]!.map((_, j) => row.reduce((s, v, k) => s + v * b[k]![j]!, 0)));
function invert(m: M3): M3 {
  const [[a, b, c], [d, e, f], [g, h, i]] = m as [[number, number, number], [number, number, number], [number, number, number]];
  const A = e * i - f * h;
  const B = -(d * i - f * g);
  const C = d * h - e * g;
  const det = a * A + b * B + c * C;
  return [
    [A / det, -(b * i - c * h) / det, (b * f - c * e) / det],
    [B / det, (a * i - c * g) / det, -(a * f - c * d) / det],
    [C / det, -(a * h - b * g) / det, (a * e - b * d) / det],
  ];
}
const xyzOf = (x: number, y: number) => [x / y, 1, (1 - x - y) / y];

/**
 * RGB → XYZ (D50) colorant matrix of an RGB space from its primaries and white, adapted to the
 * ICC's D50 PCS with Bradford. [published: ICC.1:2001-04 Annex (PCS illuminant D50 =
 * 0.9642, 1.0, 0.8249); Bradford matrix as given by Lam 1985 and the ICC v4 spec Annex E]
 */
export function computeColorantMatrix(primaries: [number, number][], white: [number, number]): M3 {
  const P = [0, 1, 2].map((row) => primaries.map(([x, y]) => xyzOf(x, y)[row]!));
  const W = xyzOf(...white);
  const S = multiply(invert(P), W.map((v) => [v]));
  const rgbToXyz = P.map((row) => row.map((v, j) => v * S[j]![0]!));
  const bradford = [
    [0.8951, 0.2664, -0.1614],
    [-0.7502, 1.7135, 0.0367],
    [0.0389, -0.0685, 1.0296],
  ];
  const d50 = [0.9642, 1, 0.8249];
  const src = multiply(bradford, W.map((v) => [v]));
  const dst = multiply(bradford, d50.map((v) => [v]));
  const gain = [0, 1, 2].map((i) => [0, 1, 2].map((j) => (i === j ? dst[i]![0]! / src[i]![0]! : 0)));
  const adapt = multiply(invert(bradford), multiply(gain, bradford));
  return multiply(adapt, rgbToXyz);
}

/**
 * A minimal ICC v2 display profile (matrix + single-gamma curves) for Adobe RGB (1998), built
 * from its published encoding: primaries R (0.6400, 0.3300), G (0.2100, 0.7100),
 * B (0.1500, 0.0600), white D65 (0.3127, 0.3290), gamma 563/256.
 * [published: Adobe RGB (1998) Color Image Encoding, version 2005-05, §4.3 and §4.3.4.2]
 * No Adobe RGB profile file is installed on this machine (/usr/share/color/icc is absent), so the
 * test builds one; header layout and tag types per ICC.1:2001-04.
 */
export function buildAdobeRgbProfile(): Buffer {
  const m = computeColorantMatrix(
    [
      [0.64, 0.33],
      [0.21, 0.71],
      [0.15, 0.06],
    ],
    [0.3127, 0.329],
  );
  const column = (j: number) => [m[0]![j]!, m[1]![j]!, m[2]![j]!];
  const curve = gammaTag(563 / 256);
  const tags: [string, Buffer][] = [
    ["desc", textDescriptionTag("Mottle test: Adobe RGB (1998) primaries")],
    ["cprt", textTag("No copyright: generated by a test from published primaries")],
    ["wtpt", xyzTag([0.9642, 1, 0.8249])],
    ["rXYZ", xyzTag(column(0))],
    ["gXYZ", xyzTag(column(1))],
    ["bXYZ", xyzTag(column(2))],
    ["rTRC", curve],
    ["gTRC", curve],
    ["bTRC", curve],
  ];
  const tableSize = 4 + 12 * tags.length;
  let offset = 128 + tableSize;
  const table = Buffer.alloc(tableSize);
  table.writeUInt32BE(tags.length, 0);
  const bodies: Buffer[] = [];
  tags.forEach(([signature, data], i) => {
    table.write(signature, 4 + 12 * i, "ascii");
    table.writeUInt32BE(offset, 8 + 12 * i);
    table.writeUInt32BE(data.length, 12 + 12 * i);
    const padded = pad4(data);
    bodies.push(padded);
    offset += padded.length;
  });
  const header = Buffer.alloc(128);
  header.writeUInt32BE(offset, 0);
  header.writeUInt32BE(0x02100000, 8); // version 2.1
  header.write("mntr", 12, "ascii");
  header.write("RGB ", 16, "ascii");
  header.write("XYZ ", 20, "ascii");
  [2024, 1, 1, 0, 0, 0].forEach((v, i) => header.writeUInt16BE(v, 24 + 2 * i));
  header.write("acsp", 36, "ascii");
  [0.9642, 1, 0.8249].forEach((v, i) => header.writeInt32BE(s15(v), 68 + 4 * i));
  return Buffer.concat([header, table, ...bodies]);
}

// ---- Files with a profile attached as-is -------------------------------------------------------

function pngChunk(type: string, data: Buffer): Buffer {
  const head = Buffer.alloc(8);
  head.writeUInt32BE(data.length, 0);
  head.write(type, 4, "ascii");
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(Buffer.concat([Buffer.from(type, "ascii"), data])) >>> 0, 0);
  return Buffer.concat([head, data, crc]);
}

/** Adds an iCCP chunk right after IHDR [published: PNG specification (W3C, 2nd ed.) §11.3.3.3]. */
export function attachPngProfile(png: Buffer, profile: Buffer): Buffer {
  const ihdrEnd = 8 + 8 + 13 + 4;
  const iccp = pngChunk("iCCP", Buffer.concat([Buffer.from("test\0\0", "latin1"), deflateSync(profile)]));
  return Buffer.concat([png.subarray(0, ihdrEnd), iccp, png.subarray(ihdrEnd)]);
}

/** Adds an APP2 ICC_PROFILE segment right after SOI [published: ICC.1:2001-04 Annex B.4]. */
export function attachJpegProfile(jpeg: Buffer, profile: Buffer): Buffer {
  const body = Buffer.concat([Buffer.from("ICC_PROFILE\0", "latin1"), Buffer.from([1, 1]), profile]);
  const head = Buffer.from([0xff, 0xe2, 0, 0]);
  head.writeUInt16BE(body.length + 2, 2);
  return Buffer.concat([jpeg.subarray(0, 2), head, body, jpeg.subarray(2)]);
}

/** Raw pixels from a painter giving device values 0–1, at a depth. */
function paintRaw(width: number, height: number, depth: Depth, paint: (x: number, y: number) => Rgb): Uint8Array | Uint16Array {
  const max = depth === 8 ? 255 : 65535;
  const raw = depth === 8 ? new Uint8Array(width * height * 3) : new Uint16Array(width * height * 3);
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) {
      const rgb = paint(x, y);
      for (let c = 0; c < 3; c++) raw[(y * width + x) * 3 + c] = Math.round(Math.min(1, Math.max(0, rgb[c] ?? 0)) * max);
    }
  }
  return raw;
}

/** A PNG at 8 or 16 bits holding exactly the painted values, with `profile` (if any) attached unchanged. */
export async function makeProfiledPng(
  width: number,
  height: number,
  options: { depth: Depth; profile?: Buffer },
  paint: (x: number, y: number) => Rgb,
): Promise<Buffer> {
  const raw = paintRaw(width, height, options.depth, paint);
  let image = sharp(raw, { raw: { width, height, channels: 3 } });
  if (options.depth === 16) image = image.toColourspace("rgb16");
  const png = await image.png({ compressionLevel: 1 }).toBuffer();
  return options.profile ? attachPngProfile(png, options.profile) : png;
}

/** A JPEG (quality 95, 4:4:4) of the painted values with `profile` attached unchanged. */
export async function makeProfiledJpeg(width: number, height: number, profile: Buffer | undefined, paint: (x: number, y: number) => Rgb): Promise<Buffer> {
  const raw = paintRaw(width, height, 8, paint);
  const jpeg = await sharp(raw, { raw: { width, height, channels: 3 } }).jpeg({ quality: 95, chromaSubsampling: "4:4:4" }).toBuffer();
  return profile ? attachJpegProfile(jpeg, profile) : jpeg;
}
