import { NextResponse } from "next/server";
import { approveVariation, getVariationAccess } from "@/db/queries/variations";
import { requireApiUser } from "@/lib/auth/session";
import { notifyVariation } from "@/lib/decisions/notify";
import { readJson, route } from "@/lib/http";
import { variationApproveSchema } from "@/lib/validation/decision";

type Context = { params: Promise<{ decisionId: string; variationId: string }> };

/** The client approves a priced variation with `confirm: true`; the decision then carries its option. */
export const POST = route(async (request, { params }: Context) => {
  const actor = await requireApiUser("client");
  const { decisionId, variationId } = await params;
  await getVariationAccess(actor, decisionId, variationId);
  const input = variationApproveSchema.parse(await readJson(request));
  const { project, decision, variation } = await approveVariation(actor, decisionId, variationId, input);
  await notifyVariation(project, decision, variation.id, "approved", "staff");
  return NextResponse.json({ variation });
});
