import { NextResponse } from "next/server";
import { createFixedItem, listFixedItems } from "@/db/queries/spec-fixed-items";
import { requireApiUser } from "@/lib/auth/session";
import { readJson, route } from "@/lib/http";
import { fixedItemSchema } from "@/lib/validation/spec";
import { getProjectForStaff } from "@/db/queries/projects";

type Context = { params: Promise<{ projectId: string }> };

/** Studio staff: the items the specification carries without a client choice. */
export const GET = route(async (_request: Request, { params }: Context) => {
  const actor = await requireApiUser("designer");
  const { projectId } = await params;
  return NextResponse.json({ items: await listFixedItems(actor, projectId) });
});

export const POST = route(async (request: Request, { params }: Context) => {
  const actor = await requireApiUser("designer");
  const { projectId } = await params;
  await getProjectForStaff(actor, projectId);
  const input = fixedItemSchema.parse(await readJson(request));
  return NextResponse.json(await createFixedItem(actor, projectId, input), { status: 201 });
});
