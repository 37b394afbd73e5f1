// Server-only by nature (node:fs); no "server-only" import so the bench can run it under plain tsx.
import { randomUUID } from "node:crypto";
import { mkdir, readFile, unlink, writeFile } from "node:fs/promises";
import path from "node:path";
import { env } from "@/lib/env";
import { extensionOf, type ImageKind } from "./limits";
import type { ImageVariant } from "./urls";

/** Only names we generate: a UUID, an optional size, a known extension. Nothing else resolves. */
const STORAGE_KEY = /^([0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12})\.(jpg|png|webp|avif)$/;

export const contentTypes: Record<string, string> = { jpg: "image/jpeg", png: "image/png", webp: "image/webp", avif: "image/avif" };

/** A fresh storage key for a photo: `<uuid>.<ext>`; the previews are `<uuid>-1600.webp` and `<uuid>-400.webp`. */
export function createStorageKey(kind: ImageKind): string {
  return `${randomUUID()}.${extensionOf[kind]}`;
}

/** The file of one variant, always inside UPLOADS_DIR (a key that isn't ours throws). */
export function locateVariant(storageKey: string, variant: ImageVariant): { file: string; contentType: string } {
  const match = STORAGE_KEY.exec(storageKey);
  if (!match) throw new Error(`not a storage key we made: ${storageKey}`);
  const [, base = "", extension = ""] = match;
  const name = variant === "original" ? storageKey : `${base}-${variant}.webp`;
  const root = path.resolve(env.UPLOADS_DIR);
  const file = path.resolve(root, name);
  if (path.dirname(file) !== root) throw new Error("upload path escaped the uploads folder");
  return { file, contentType: contentTypes[variant === "original" ? extension : "webp"] ?? "application/octet-stream" };
}

export type PhotoFiles = Record<ImageVariant, Buffer>;

/** Removes what exists of a photo's files; missing files are fine. */
export async function removePhotoFiles(storageKey: string): Promise<void> {
  const variants: ImageVariant[] = ["original", "1600", "400"];
  await Promise.all(variants.map((v) => unlink(locateVariant(storageKey, v).file).catch(() => undefined)));
}

/**
 * Writes all three files or none: `wx` never overwrites, and on any failure the ones written
 * are removed again before the error goes on.
 */
export async function writePhotoFiles(storageKey: string, files: PhotoFiles): Promise<void> {
  await mkdir(path.resolve(env.UPLOADS_DIR), { recursive: true });
  try {
    await Promise.all(
      (Object.keys(files) as ImageVariant[]).map((v) => writeFile(locateVariant(storageKey, v).file, files[v], { flag: "wx", mode: 0o640 })),
    );
  } catch (error) {
    await removePhotoFiles(storageKey);
    throw error;
  }
}

export async function readPhotoFile(storageKey: string, variant: ImageVariant): Promise<{ body: Buffer; contentType: string } | null> {
  const { file, contentType } = locateVariant(storageKey, variant);
  try {
    return { body: await readFile(file), contentType };
  } catch {
    return null;
  }
}
