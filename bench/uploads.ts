// Upload pipeline benchmark: `npm run bench:uploads` (also part of `npm run bench`).
// Not a test: prints our whole pipeline on a generated 12-megapixel JPEG beside a bare sharp resize.
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { pathToFileURL } from "node:url";
import sharp from "sharp";

export type Row = { measure: string; ours: string; baseline: string; ratio: string; target: string; met: "yes" | "no" | "–" };

const RUNS = 9;

/** A 4000 × 3000 photo-like JPEG: soft mottling with grain (a honed stone), EXIF with GPS, as a phone writes it. */
async function makePhoto(orientation: 1 | 6): Promise<Buffer> {
  const width = 4000;
  const height = 3000;
  let seed = 7;
  const random = () => ((seed = (seed * 1103515245 + 12345) >>> 0) >>> 8) / 16777216;
  const low = Buffer.alloc(400 * 300 * 3);
  for (let i = 0; i < 400 * 300; i++) {
    const v = random() * 50;
    low.set([190 - v, 182 - v, 168 - v * 0.9], i * 3);
  }
  const smooth = await sharp(low, { raw: { width: 400, height: 300, channels: 3 } }).resize(width, height, { kernel: "cubic" }).blur(3).raw().toBuffer();
  for (let i = 0; i < smooth.length; i++) smooth[i] = Math.max(0, Math.min(255, (smooth[i] ?? 0) + Math.floor(random() * 12) - 6));
  const tagged = await sharp(smooth, { raw: { width, height, channels: 3 } })
    .jpeg({ quality: 92 })
    .withExif({ IFD0: { Make: "Bench camera" }, IFD3: { GPSLatitudeRef: "S", GPSLatitude: "33/1 52/1 10/1" } })
    .toBuffer();
  return orientation === 1 ? tagged : sharp(tagged).withMetadata({ orientation }).jpeg({ quality: 92 }).toBuffer();
}

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[sorted.length >> 1] ?? NaN;
}

async function time(fn: () => Promise<unknown>): Promise<number> {
  const start = performance.now();
  await fn();
  return performance.now() - start;
}

/** Our figure and the baseline, run alternately so a busy machine slows both alike. */
async function compare(ours: () => Promise<unknown>, baseline: () => Promise<unknown>): Promise<{ ours: number; baseline: number }> {
  await ours();
  await baseline();
  const a: number[] = [];
  const b: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    a.push(await time(ours));
    b.push(await time(baseline));
  }
  return { ours: median(a), baseline: median(b) };
}

function row(measure: string, result: { ours: number; baseline: number }, baselineName: string, target: number | null): Row {
  const ratio = result.ours / result.baseline;
  return {
    measure,
    ours: `${result.ours.toFixed(0)} ms`,
    baseline: `${result.baseline.toFixed(0)} ms (${baselineName})`,
    ratio: `${ratio.toFixed(2)}×`,
    target: target === null ? "reported" : `≤ ${target}×`,
    met: target === null ? "–" : ratio <= target ? "yes" : "no",
  };
}

export async function runUploadsBench(): Promise<Row[]> {
  const dir = mkdtempSync(path.join(tmpdir(), "mottle-bench-uploads-"));
  process.env.UPLOADS_DIR ??= dir;
  // Loaded after UPLOADS_DIR is set: lib/env reads it once.
  const { checkUpload } = await import("../lib/uploads/check");
  const { processPhoto } = await import("../lib/uploads/pipeline");
  const { createStorageKey, removePhotoFiles, writePhotoFiles } = await import("../lib/uploads/storage");
  try {
    const rows: Row[] = [];
    for (const orientation of [1, 6] as const) {
      const photo = await makePhoto(orientation);
      const whole = async () => {
        const kind = checkUpload({ name: "IMG_0001.jpg", type: "image/jpeg", bytes: photo });
        const processed = await processPhoto(photo, kind);
        const key = createStorageKey(kind);
        await writePhotoFiles(key, { original: processed.original, "1600": processed.large, "400": processed.thumb });
        await removePhotoFiles(key);
      };
      if (orientation === 1) {
        const bare = () => sharp(photo).resize(1600, 1600, { fit: "inside" }).webp().toBuffer();
        rows.push(row("upload pipeline, 12 MP JPEG: check, strip, orient, 1600+400 WebP, measure, write", await compare(whole, bare), "bare resize 1600 WebP", 1.5));
        // The same against a resize with our (faster) WebP settings, so the tuning is in plain view.
        const tuned = () => sharp(photo).resize(1600, 1600, { fit: "inside" }).webp({ quality: 82, effort: 2 }).toBuffer();
        rows.push(row("  the same, against a resize with our WebP settings", await compare(whole, tuned), "resize 1600 WebP effort 2", null));
      } else {
        // A portrait phone photo: turning the full-size original upright is most of the extra work.
        const bare = () => sharp(photo, { autoOrient: true }).resize(1600, 1600, { fit: "inside" }).webp().toBuffer();
        rows.push(row("  the same on an EXIF-rotated 12 MP JPEG (portrait phone photo)", await compare(whole, bare), "bare upright resize 1600 WebP", null));
      }
    }
    return rows;
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

function printTable(rows: Row[]): void {
  const columns = ["measure", "ours", "baseline", "ratio", "target", "met"] as const;
  const widths = columns.map((c) => Math.max(c.length, ...rows.map((r) => r[c].length)));
  const line = (cells: readonly string[]): string => cells.map((c, k) => c.padEnd(widths[k] ?? 0)).join("  ");
  console.log(line(columns));
  console.log(line(widths.map((w) => "-".repeat(w))));
  for (const r of rows) console.log(line(columns.map((c) => r[c])));
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  printTable(await runUploadsBench());
}
