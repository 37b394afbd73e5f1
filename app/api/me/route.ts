import { NextResponse } from "next/server";
import { homePathFor } from "@/db/queries/users";
import { requireApiUser } from "@/lib/auth/session";
import { route } from "@/lib/http";

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
