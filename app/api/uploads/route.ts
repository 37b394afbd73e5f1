import { NextResponse } from "next/server";
import { saveUploadedPhoto } from "@/db/queries/finish-images";
import { requireApiUser } from "@/lib/auth/session";
import { route } from "@/lib/http";
import { checkUpload } from "@/lib/uploads/check";
import { describeUploadMeasurement } from "@/lib/uploads/measured";
import { processPhoto } from "@/lib/uploads/pipeline";
import { readUploadedFile } from "@/lib/uploads/read-form";
import { imageUrl } from "@/lib/uploads/urls";

/**
 * A sample photo for the library (multipart, field `file`). Checked (size, name, declared and
 * real type, pixels), converted to sRGB through its ICC profile, stripped of all metadata, stored
 * under generated names with 1600 px and 400 px WebP copies, and measured. Refusals write nothing:
 * 413, 415 or 422. A photo too clipped to measure is still stored: `measured: false` and
 * `notMeasured` say why, and no colour is claimed.
 */
export const POST = route(async (request) => {
  const actor = await requireApiUser("designer");
  const file = await readUploadedFile(request);
  const kind = checkUpload(file);
  const photo = await processPhoto(file.bytes, kind);
  const image = await saveUploadedPhoto(actor, kind, photo);
  return NextResponse.json(
    {
      id: image.id,
      url: imageUrl(image.id, "1600"),
      thumbUrl: imageUrl(image.id, "400"),
      originalUrl: imageUrl(image.id, "original"),
      width: image.width,
      height: image.height,
      ...describeUploadMeasurement(photo.analysis, photo.notMeasured),
    },
    { status: 201 },
  );
});
