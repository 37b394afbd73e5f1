"use server";

import { redirect } from "next/navigation";
import { createProject } from "@/db/queries/projects";
import { failure, formValues, keptValues, type ActionResult } from "@/lib/actions/result";
import { requireApiUser } from "@/lib/auth/session";
import { createProjectSchema } from "@/lib/validation/project";

export async function createProjectAction(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  let projectId: string;
  try {
    const actor = await requireApiUser("designer");
    const input = createProjectSchema.parse(formValues(form));
    projectId = (await createProject(actor, input)).id;
  } catch (error) {
    return failure(error, keptValues(form));
  }
  redirect(`/studio/projects/${projectId}`);
}
