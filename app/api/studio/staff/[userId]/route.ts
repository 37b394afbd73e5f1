import { NextResponse } from "next/server";
import { assertStaffOfMyStudio, changeStaffRole, removeStaff } from "@/db/queries/staff";
import { requireApiUser } from "@/lib/auth/session";
import { readJson, route } from "@/lib/http";
import { staffRoleSchema } from "@/lib/validation/member";

type Context = { params: Promise<{ userId: string }> };

/** Owners only: `{ role: "owner" | "designer" }`; never the last owner (409). Ends the person's sessions. */
export const PATCH = route(async (request: Request, { params }: Context) => {
  const actor = await requireApiUser("owner");
  const { userId } = await params;
  await assertStaffOfMyStudio(actor, userId);
  const input = staffRoleSchema.parse(await readJson(request));
  return NextResponse.json(await changeStaffRole(actor, userId, input.role));
});

/** Owners only: takes the person off the studio's staff; never the last owner (409). */
export const DELETE = route(async (_request: Request, { params }: Context) => {
  const actor = await requireApiUser("owner");
  const { userId } = await params;
  await removeStaff(actor, userId);
  return new Response(null, { status: 204 });
});
