import { NextResponse } from "next/server";
import { deleteFixedItem, getFixedItem, updateFixedItem } from "@/db/queries/spec-fixed-items";
import { requireApiUser } from "@/lib/auth/session";
import { HttpError, readJson, route } from "@/lib/http";
import { fixedItemSchema } from "@/lib/validation/spec";

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === "object" && v !== null && !Array.isArray(v);

type Context = { params: Promise<{ projectId: string; fixedItemId: string }> };

/** Changes the fields given; the current specification changes, issued revisions do not. */
export const PATCH = route(async (request: Request, { params }: Context) => {
  const actor = await requireApiUser("designer");
  const { projectId, fixedItemId } = await params;
  // Access first: someone who may not see the item learns nothing from how their body is judged.
  const { item } = await getFixedItem(actor, projectId, fixedItemId);
  const body = await readJson(request);
  if (!isObject(body)) throw new HttpError(400, "The request body must be a JSON object of the fields to change.");
  const { roomId, finishId, location, quantity, unit, notes } = item;
  const input = fixedItemSchema.parse({ roomId, finishId, item: item.item, location, quantity, unit, notes, ...body });
  return NextResponse.json(await updateFixedItem(actor, projectId, fixedItemId, input));
});

export const DELETE = route(async (_request: Request, { params }: Context) => {
  const actor = await requireApiUser("designer");
  const { projectId, fixedItemId } = await params;
  await deleteFixedItem(actor, projectId, fixedItemId);
  return new Response(null, { status: 204 });
});
