import { NextResponse } from "next/server";
import { getStudioImage } from "@/db/queries/finish-images";
import { requireApiUser } from "@/lib/auth/session";
import { notFound, readJson, route } from "@/lib/http";
import { measureRequestSchema } from "@/lib/uploads/measure-request";
import { describeMeasurement } from "@/lib/uploads/measured";
import { remeasurePhoto } from "@/lib/uploads/pipeline";
import { readPhotoFile } from "@/lib/uploads/storage";

type Context = { params: Promise<{ imageId: string }> };

/**
 * Measures a stored photo again. With `neutral` (a box over a white or grey card, in pixels of
 * the stored photo) and the card's `reflectance` (per cent, 2–98) the light's colour cast and the
 * camera's exposure are removed first and the card is left out. 422 with a plain reason when the
 * photo or the card is too clipped to measure.
 */
export const POST = route(async (request, { params }: Context) => {
  const actor = await requireApiUser("designer");
  const { neutral, reflectance } = measureRequestSchema.parse(await readJson(request));
  const image = await getStudioImage(actor, (await params).imageId);
  const file = await readPhotoFile(image.storageKey, "original");
  if (!file) throw notFound("That photo");
  const card = neutral && reflectance !== undefined ? { box: neutral, reflectance: reflectance / 100 } : undefined;
  return NextResponse.json(describeMeasurement(await remeasurePhoto(file.body, card)));
});
