import { HttpError } from "@/lib/http";
import { declaredExtensions, declaredMimes, kindNames, MAX_UPLOAD_BYTES, MAX_UPLOAD_MEGABYTES, type ImageKind } from "./limits";
import { sniffImageKind } from "./sniff";

const ACCEPTED = "Upload a JPEG, PNG, WebP or AVIF photo.";

export const tooLarge = () =>
  new HttpError(413, `That file is larger than ${MAX_UPLOAD_MEGABYTES} MB. Export the photo smaller (a few thousand pixels across is plenty) and try again.`);

/**
 * We never use the sender's file name, but one that tries to climb out of a folder (or hides
 * control characters) says the request didn't come from a browser's file picker: refuse it.
 */
export function checkFileName(name: string): void {
  const hostile = /[/\\\u0000-\u001f\u007f]/.test(name) || name === "." || name === ".." || name.length > 255;
  if (hostile) {
    throw new HttpError(422, "That file name can't be used. Rename the file (no slashes or special characters) and try again.");
  }
}

/** The type the sender claims: the part's Content-Type, or its extension when the browser sent none. */
export function readDeclaredKind(name: string, type: string): ImageKind | null {
  const mime = type.split(";")[0]?.trim().toLowerCase() ?? "";
  if (mime && mime !== "application/octet-stream") return declaredMimes[mime] ?? null;
  const extension = name.toLowerCase().split(".").pop() ?? "";
  return declaredExtensions[extension] ?? null;
}

/**
 * Size, name, declared type and sniffed type of an uploaded file, cheapest first: 413 when too
 * large, 422 for a hostile name, 415 unless both the declared and the real type are one we take
 * and they agree.
 */
export function checkUpload(file: { name: string; type: string; bytes: Uint8Array }): ImageKind {
  if (file.bytes.byteLength > MAX_UPLOAD_BYTES) throw tooLarge();
  checkFileName(file.name);
  const declared = readDeclaredKind(file.name, file.type);
  if (!declared) throw new HttpError(415, `That file isn't a photo we can use. ${ACCEPTED}`);
  const sniffed = sniffImageKind(file.bytes);
  if (!sniffed) throw new HttpError(415, `That file says it is a ${kindNames[declared]} but isn't one. ${ACCEPTED}`);
  if (sniffed !== declared) {
    throw new HttpError(415, `That file says it is a ${kindNames[declared]} but is really a ${kindNames[sniffed]}. Save it with the right type and try again.`);
  }
  return sniffed;
}
