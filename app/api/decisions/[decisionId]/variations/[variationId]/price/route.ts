import { NextResponse } from "next/server";
import { getVariationAccess, priceVariation } from "@/db/queries/variations";
import { requireApiUser } from "@/lib/auth/session";
import { notifyVariation } from "@/lib/decisions/notify";
import { readJson, route } from "@/lib/http";
import { variationPriceSchema } from "@/lib/validation/decision";

type Context = { params: Promise<{ decisionId: string; variationId: string }> };

/** The designer prices a variation: difference including GST, time impact, and the option it carries. */
export const POST = route(async (request, { params }: Context) => {
  const actor = await requireApiUser("designer");
  const { decisionId, variationId } = await params;
  await getVariationAccess(actor, decisionId, variationId);
  const input = variationPriceSchema.parse(await readJson(request));
  const { project, decision, variation } = await priceVariation(actor, decisionId, variationId, input);
  await notifyVariation(project, decision, variation.id, "priced", "clients");
  return NextResponse.json({ variation });
});
