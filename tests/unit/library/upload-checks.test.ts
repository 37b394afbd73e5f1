import { describe, expect, it } from "vitest";
import { checkFileName, checkUpload, readDeclaredKind } from "@/lib/uploads/check";
import { MAX_UPLOAD_BYTES } from "@/lib/uploads/limits";
import { sniffImageKind } from "@/lib/uploads/sniff";
import { HttpError } from "@/lib/http";

const bytes = (...values: (number | string)[]) =>
  new Uint8Array(values.flatMap((v) => (typeof v === "string" ? [...v].map((c) => c.charCodeAt(0)) : [v])));

function statusOf(fn: () => unknown): number | null {
  try {
    fn();
    return null;
  } catch (error) {
    return error instanceof HttpError ? error.status : -1;
  }
}

describe("sniffImageKind", () => {
  it("knows each accepted signature [published: JPEG SOI FF D8 FF; PNG 8-byte signature; RIFF….WEBP; ISO-BMFF ftyp avif]", () => {
    expect(sniffImageKind(bytes(0xff, 0xd8, 0xff, 0xe0))).toBe("jpeg");
    expect(sniffImageKind(bytes(0x89, "PNG", 0x0d, 0x0a, 0x1a, 0x0a))).toBe("png");
    expect(sniffImageKind(bytes("RIFF", 0, 0, 0, 0, "WEBPVP8 "))).toBe("webp");
    expect(sniffImageKind(bytes(0, 0, 0, 0x1c, "ftyp", "avif", 0, 0, 0, 0, "mif1", "miaf"))).toBe("avif");
    expect(sniffImageKind(bytes(0, 0, 0, 0x1c, "ftyp", "mif1", 0, 0, 0, 0, "mif1", "avif"))).toBe("avif");
  });

  it("refuses look-alikes: HEIC, SVG, GIF, text, a cut-off PNG signature", () => {
    expect(sniffImageKind(bytes(0, 0, 0, 0x18, "ftyp", "heic", 0, 0, 0, 0, "mif1", "heic"))).toBeNull();
    expect(sniffImageKind(bytes("<svg xmlns"))).toBeNull();
    expect(sniffImageKind(bytes("GIF89a"))).toBeNull();
    expect(sniffImageKind(bytes("hello"))).toBeNull();
    expect(sniffImageKind(bytes(0x89, "PNG"))).toBeNull();
  });
});

describe("checkFileName", () => {
  it.each(["../../etc/passwd.jpg", "..\\evil.png", "/abs/path.jpg", "a\u0000.jpg", "line\nbreak.png", "..", "."])("refuses %j with 422", (name) => {
    expect(statusOf(() => checkFileName(name))).toBe(422);
  });

  it.each(["IMG_2041.jpg", "Cloudline marble (honed).png", "..swatch.webp", "été.avif"])("takes %j", (name) => {
    expect(statusOf(() => checkFileName(name))).toBeNull();
  });
});

describe("readDeclaredKind", () => {
  it("reads the part's type first, and the extension only when the browser sent none", () => {
    expect(readDeclaredKind("x.png", "image/jpeg")).toBe("jpeg");
    expect(readDeclaredKind("x.AVIF", "")).toBe("avif");
    expect(readDeclaredKind("x.jpeg", "application/octet-stream")).toBe("jpeg");
    expect(readDeclaredKind("x.svg", "image/svg+xml")).toBeNull();
    expect(readDeclaredKind("x.gif", "")).toBeNull();
  });
});

describe("checkUpload", () => {
  const jpeg = bytes(0xff, 0xd8, 0xff, 0xe0, 0, 0);
  it("answers 413 past 15 MB before looking at anything else", () => {
    expect(statusOf(() => checkUpload({ name: "../x.svg", type: "image/svg+xml", bytes: new Uint8Array(MAX_UPLOAD_BYTES + 1) }))).toBe(413);
  });
  it("answers 415 when the declared and the real type differ or either is not accepted", () => {
    expect(statusOf(() => checkUpload({ name: "a.png", type: "image/png", bytes: jpeg }))).toBe(415);
    expect(statusOf(() => checkUpload({ name: "a.gif", type: "image/gif", bytes: jpeg }))).toBe(415);
  });
  it("passes a JPEG that says it is one", () => {
    expect(checkUpload({ name: "a.jpg", type: "image/jpeg", bytes: jpeg })).toBe("jpeg");
  });
});
