import { NextResponse } from "next/server";
import { deleteFinish, getFinish, updateFinish } from "@/db/queries/finishes";
import { requireApiUser } from "@/lib/auth/session";
import { readJson, route } from "@/lib/http";
import { finishPatchSchema } from "@/lib/validation/finish";

type Context = { params: Promise<{ finishId: string }> };

export const GET = route(async (_request, { params }: Context) => {
  const actor = await requireApiUser("designer");
  return NextResponse.json(await getFinish(actor, (await params).finishId));
});

/** Any subset of the finish's fields; `{ "archived": true }` archives it, `false` brings it back. */
export const PATCH = route(async (request, { params }: Context) => {
  const actor = await requireApiUser("designer");
  const patch = finishPatchSchema.parse(await readJson(request));
  return NextResponse.json(await updateFinish(actor, (await params).finishId, patch));
});

/** Only a finish nothing uses can go; one on a board, decision or specification answers 409. */
export const DELETE = route(async (_request, { params }: Context) => {
  const actor = await requireApiUser("designer");
  await deleteFinish(actor, (await params).finishId);
  return new NextResponse(null, { status: 204 });
});
