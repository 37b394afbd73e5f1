import { NextResponse } from "next/server";
import { listSimilarFinishes } from "@/db/queries/finish-similar";
import { requireApiUser } from "@/lib/auth/session";
import { route } from "@/lib/http";
import { similarQuerySchema } from "@/lib/validation/finish";

type Context = { params: Promise<{ finishId: string }> };

/**
 * Current finishes within `maxDeltaE` (CIEDE2000, default 3) of this one, nearest first, from the
 * same category unless `anyCategory=1`.
 */
export const GET = route(async (request, { params }: Context) => {
  const actor = await requireApiUser("designer");
  const { maxDeltaE, limit, anyCategory } = similarQuerySchema.parse(Object.fromEntries(new URL(request.url).searchParams));
  const items = await listSimilarFinishes(actor, (await params).finishId, maxDeltaE, limit, { anyCategory });
  return NextResponse.json({ maxDeltaE, anyCategory, items });
});
