import { NextResponse } from "next/server";
import { getStudioImage } from "@/db/queries/finish-images";
import { requireApiUser } from "@/lib/auth/session";
import { notFound, readJson, route } from "@/lib/http";
import { describeMeasurement } from "@/lib/uploads/measured";
import { remeasurePhoto } from "@/lib/uploads/pipeline";
import { readPhotoFile } from "@/lib/uploads/storage";
import { measureSchema } from "@/lib/validation/finish";

type Context = { params: Promise<{ imageId: string }> };

/**
 * Measures a stored photo again. With `neutral` (a box over a white or grey card, in pixels of
 * the stored photo) the light's colour cast is removed first and the card is left out.
 */
export const POST = route(async (request, { params }: Context) => {
  const actor = await requireApiUser("designer");
  const { neutral } = measureSchema.parse(await readJson(request));
  const image = await getStudioImage(actor, (await params).imageId);
  const file = await readPhotoFile(image.storageKey, "original");
  if (!file) throw notFound("That photo");
  return NextResponse.json(describeMeasurement(await remeasurePhoto(file.body, neutral)));
});
