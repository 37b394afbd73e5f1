import { NextResponse } from "next/server";
import { createFinish, requireStudioId } from "@/db/queries/finishes";
import { listFinishesJson } from "@/db/queries/finish-list";
import { requireApiUser } from "@/lib/auth/session";
import { jsonBytesResponse, readJson, route } from "@/lib/http";
import { finishInputSchema, finishListQuerySchema } from "@/lib/validation/finish";

/** One page of the studio's library: `?q=&category=&supplier=&page=&pageSize=&sort=&dir=&status=`. */
export const GET = route(async (request) => {
  const actor = await requireApiUser("designer");
  const query = finishListQuerySchema.parse(Object.fromEntries(new URL(request.url).searchParams));
  return jsonBytesResponse(await listFinishesJson(requireStudioId(actor), query));
});

export const POST = route(async (request) => {
  const actor = await requireApiUser("designer");
  const input = finishInputSchema.parse(await readJson(request));
  return NextResponse.json(await createFinish(actor, input), { status: 201 });
});
