import { getViewableImage } from "@/db/queries/finish-images";
import { requireApiUser } from "@/lib/auth/session";
import { notFound, route } from "@/lib/http";
import { readPhotoFile } from "@/lib/uploads/storage";
import { imageVariants, type ImageVariant } from "@/lib/uploads/urls";

type Context = { params: Promise<{ imageId: string; variant: string }> };

const isVariant = (v: string): v is ImageVariant => (imageVariants as readonly string[]).includes(v);

/**
 * A stored photo, to people allowed to see the finish it belongs to. Only ever an image type
 * (the file was re-encoded by us), with nosniff and inline disposition so a browser never runs it.
 */
export const GET = route(async (_request, { params }: Context) => {
  const actor = await requireApiUser();
  const { imageId, variant } = await params;
  if (!isVariant(variant)) throw notFound("That photo");
  const image = await getViewableImage(actor, imageId);
  const file = await readPhotoFile(image.storageKey, variant);
  if (!file) throw notFound("That photo");
  return new Response(new Uint8Array(file.body), {
    headers: {
      "Content-Type": file.contentType,
      "Content-Length": String(file.body.byteLength),
      "X-Content-Type-Options": "nosniff",
      "Content-Disposition": "inline",
      "Content-Security-Policy": "default-src 'none'; sandbox",
      // Per person (the check above); short, so a removed client stops seeing it soon.
      "Cache-Control": "private, max-age=3600",
    },
  });
});
