import { NextResponse } from "next/server";
import { updateProject } from "@/db/queries/project-edits";
import { getProjectForStaff } from "@/db/queries/projects";
import { requireApiUser } from "@/lib/auth/session";
import { readJson, route } from "@/lib/http";
import { editProjectSchema } from "@/lib/validation/project";

type Context = { params: Promise<{ projectId: string }> };

/**
 * Corrects the project's name, site address or install date (YYYY-MM-DD, or null to clear).
 * Order-by dates on decisions and the current specification follow the install date at once.
 */
export const PATCH = route(async (request: Request, { params }: Context) => {
  const actor = await requireApiUser("designer");
  const { projectId } = await params;
  await getProjectForStaff(actor, projectId);
  const input = editProjectSchema.parse(await readJson(request));
  const project = await updateProject(actor, projectId, input);
  return NextResponse.json({ id: project.id, name: project.name, siteAddress: project.siteAddress, installDate: project.installDate });
});
