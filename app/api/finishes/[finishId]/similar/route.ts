import { NextResponse } from "next/server";
import { listSimilarFinishes } from "@/db/queries/finish-similar";
import { requireApiUser } from "@/lib/auth/session";
import { route } from "@/lib/http";
import { similarQuerySchema } from "@/lib/validation/finish";

type Context = { params: Promise<{ finishId: string }> };

/** Current finishes within `maxDeltaE` (CIEDE2000, default 3) of this one, nearest first. */
export const GET = route(async (request, { params }: Context) => {
  const actor = await requireApiUser("designer");
  const { maxDeltaE, limit } = similarQuerySchema.parse(Object.fromEntries(new URL(request.url).searchParams));
  const items = await listSimilarFinishes(actor, (await params).finishId, maxDeltaE, limit);
  return NextResponse.json({ maxDeltaE, items });
});
