import { NextResponse } from "next/server";
import { listProjectsForActor } from "@/db/queries/projects";
import { requireApiUser } from "@/lib/auth/session";
import { route } from "@/lib/http";

/** Projects this person may see, with their role on each. */
export const GET = route(async () => {
  const actor = await requireApiUser();
  const projects = await listProjectsForActor(actor);
  return NextResponse.json({ items: projects });
});
