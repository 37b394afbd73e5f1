import { NextResponse } from "next/server";
import { changeMemberRole, getMemberForStaff, removeMember } from "@/db/queries/members";
import { requireApiUser } from "@/lib/auth/session";
import { readJson, route } from "@/lib/http";
import { memberRoleSchema } from "@/lib/validation/member";

type Context = { params: Promise<{ projectId: string; userId: string }> };

/**
 * `{ role: "client" }` or `{ role: "supplier", supplierId }`: the person's sessions end, so their
 * next request sees only what the new role may.
 */
export const PATCH = route(async (request: Request, { params }: Context) => {
  const actor = await requireApiUser("designer");
  const { projectId, userId } = await params;
  await getMemberForStaff(actor, projectId, userId);
  const input = memberRoleSchema.parse(await readJson(request));
  const member = await changeMemberRole(actor, projectId, userId, input);
  return NextResponse.json({ userId: member.userId, role: member.role, supplierId: member.supplierId });
});

/** Takes the person off the project; what they chose and approved stays recorded. */
export const DELETE = route(async (_request: Request, { params }: Context) => {
  const actor = await requireApiUser("designer");
  const { projectId, userId } = await params;
  await removeMember(actor, projectId, userId);
  return new Response(null, { status: 204 });
});
