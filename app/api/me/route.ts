import { NextResponse } from "next/server";
import { updateProfile } from "@/db/queries/account";
import { homePathFor } from "@/db/queries/users";
import { requireApiUser } from "@/lib/auth/session";
import { readJson, route } from "@/lib/http";
import { profileSchema } from "@/lib/validation/account";

/** The signed-in person and their roles; 401 when signed out. */
export const GET = route(async () => {
  const actor = await requireApiUser();
  const roles = [
    ...(actor.studio ? [actor.studio.role] : []),
    ...new Set(actor.projects.map((p) => p.role)),
  ];
  return NextResponse.json({
    id: actor.userId,
    email: actor.email,
    name: actor.name,
    roles,
    studio: actor.studio,
    projects: actor.projects.map(({ projectId, role, supplierId }) => ({ projectId, role, supplierId })),
    home: homePathFor(actor),
  });
});

/** The person's own name and phone: `{ name?, phone? }` (an empty or null phone clears it). */
export const PATCH = route(async (request: Request) => {
  const actor = await requireApiUser();
  const input = profileSchema.parse(await readJson(request));
  return NextResponse.json(await updateProfile(actor, input));
});
