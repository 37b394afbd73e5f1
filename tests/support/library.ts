import { createClient } from "@libsql/client";
import { markWritten } from "@/db/queries/read-cache";
import { readdirSync } from "node:fs";
import sharp from "sharp";
import { actAs, type Persona } from "./session";

/** The personas every library route is tried as: staff of the owning studio, another studio, and the outsiders. */
export const everyone: Persona[] = ["owner", "designer", "other", "client", "stone", "anonymous"];

type Handler<P> = (request: Request, context: { params: Promise<P> }) => Promise<Response>;

export type Answer = { status: number; body: Record<string, unknown>; headers: Headers; bytes: Buffer };

/** Calls a route handler as a persona, the way Next would, and reads the answer as JSON when it is JSON. */
export async function call<P extends Record<string, string>>(
  persona: Persona,
  handler: Handler<P>,
  path: string,
  init: { method?: string; json?: unknown; form?: FormData; text?: string; params?: P } = {},
): Promise<Answer> {
  actAs(persona);
  const headers = new Headers({ origin: "http://mottle.test" });
  let body: BodyInit | undefined;
  if (init.json !== undefined) {
    headers.set("content-type", "application/json");
    body = JSON.stringify(init.json);
  } else if (init.form) body = init.form;
  else if (init.text !== undefined) {
    headers.set("content-type", "text/csv");
    body = init.text;
  }
  const request = new Request(`http://test${path}`, { method: init.method ?? (body ? "POST" : "GET"), headers, body });
  const res = await handler(request, { params: Promise.resolve(init.params ?? ({} as P)) });
  const bytes = Buffer.from(await res.arrayBuffer());
  const isJson = res.headers.get("content-type")?.includes("json");
  return { status: res.status, headers: res.headers, bytes, body: isJson && bytes.length ? (JSON.parse(bytes.toString()) as Record<string, unknown>) : {} };
}

export async function countRows(table: string, where = "1 = 1"): Promise<number> {
  const client = createClient({ url: process.env.DATABASE_URL ?? "" });
  try {
    const { rows } = await client.execute(`select count(*) as n from "${table}" where ${where}`);
    return Number(rows[0]?.n);
  } finally {
    client.close();
  }
}

export async function runSql(statement: string, args: (string | number | null)[] = []): Promise<void> {
  const client = createClient({ url: process.env.DATABASE_URL ?? "" });
  try {
    await client.execute({ sql: statement, args });
  } finally {
    client.close();
    // Behind the app's back: whatever it has cached is stale now.
    markWritten();
  }
}

export function listUploads(): string[] {
  try {
    return readdirSync(process.env.UPLOADS_DIR ?? "").sort();
  } catch {
    return [];
  }
}

/** A multipart form with one file, as a browser's file picker would send it. */
export function fileForm(bytes: Uint8Array, name: string, type: string): FormData {
  const form = new FormData();
  form.set("file", new File([new Uint8Array(bytes)], name, { type }));
  return form;
}

/**
 * A photo-like JPEG: a sage ground with a darker diagonal band, plus EXIF carrying a GPS position
 * and a marker, as a phone's camera writes them, and orientation 6 (turn 90° clockwise to view).
 */
export async function makeJpegWithGps(width = 96, height = 64): Promise<Buffer> {
  const raw = Buffer.alloc(width * height * 3);
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) {
      const band = Math.abs(x - y) < 8;
      raw.set(band ? [90, 100, 80] : [150, 160, 120], (y * width + x) * 3);
    }
  }
  const tagged = await sharp(raw, { raw: { width, height, channels: 3 } })
    .jpeg({ quality: 95 })
    .withExif({
      IFD0: { ImageDescription: "mottle-exif-marker", Make: "Test camera" },
      IFD3: { GPSLatitudeRef: "S", GPSLatitude: "33/1 52/1 10/1", GPSLongitudeRef: "E", GPSLongitude: "151/1 12/1 30/1" },
    })
    .toBuffer();
  // withMetadata keeps the EXIF above and adds the orientation tag.
  return sharp(tagged).withMetadata({ orientation: 6 }).jpeg({ quality: 95 }).toBuffer();
}

export async function makeFlatImage(format: "png" | "webp" | "avif" | "jpeg", hex: string, width = 48, height = 48): Promise<Buffer> {
  return sharp({ create: { width, height, channels: 3, background: hex } })[format]().toBuffer();
}
