import { HttpError } from "@/lib/http";
import { tooLarge } from "./check";
import { MAX_UPLOAD_BYTES } from "./limits";

// Room for the multipart boundaries and part headers around one file.
const ENVELOPE_BYTES = 64 * 1024;

/** Reads the body, stopping as soon as it passes `limit` bytes so a huge upload never sits in memory. */
async function readBodyWithin(request: Request, limit: number): Promise<Uint8Array<ArrayBuffer>> {
  const declared = Number(request.headers.get("content-length") ?? NaN);
  if (Number.isFinite(declared) && declared > limit) throw tooLarge();
  if (!request.body) return new Uint8Array();
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > limit) {
      await reader.cancel();
      throw tooLarge();
    }
    chunks.push(value);
  }
  const body = new Uint8Array(total);
  let at = 0;
  for (const chunk of chunks) {
    body.set(chunk, at);
    at += chunk.byteLength;
  }
  return body;
}

export type UploadedFile = { name: string; type: string; bytes: Uint8Array };

/** The multipart `file` field of an upload: 413 past the size limit, 400 when there is no file. */
export async function readUploadedFile(request: Request): Promise<UploadedFile> {
  const contentType = request.headers.get("content-type") ?? "";
  if (!contentType.toLowerCase().startsWith("multipart/form-data")) {
    throw new HttpError(400, "Send the photo as multipart/form-data in a field called file.");
  }
  const body = await readBodyWithin(request, MAX_UPLOAD_BYTES + ENVELOPE_BYTES);
  let form: FormData;
  try {
    form = await new Response(body, { headers: { "content-type": contentType } }).formData();
  } catch {
    throw new HttpError(400, "The upload was cut off or malformed. Try again.");
  }
  const file = form.get("file");
  if (!file || typeof file === "string") {
    throw new HttpError(400, "Choose a photo to upload.", { file: ["Choose a photo to upload."] });
  }
  return { name: file.name, type: file.type, bytes: new Uint8Array(await file.arrayBuffer()) };
}
