import { HttpError } from "@/lib/http";
import { readBodyWithin } from "@/lib/request-body";
import { tooLarge } from "./check";
import { MAX_UPLOAD_BYTES } from "./limits";

// Room for the multipart boundaries and part headers around one file.
const ENVELOPE_BYTES = 64 * 1024;

export type UploadedFile = { name: string; type: string; bytes: Uint8Array };

/** The multipart `file` field of an upload: 413 past the size limit, 400 when there is no file. */
export async function readUploadedFile(request: Request): Promise<UploadedFile> {
  const contentType = request.headers.get("content-type") ?? "";
  if (!contentType.toLowerCase().startsWith("multipart/form-data")) {
    throw new HttpError(400, "Send the photo as multipart/form-data in a field called file.");
  }
  const body = await readBodyWithin(request, MAX_UPLOAD_BYTES + ENVELOPE_BYTES, tooLarge);
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
