"use server";

import { redirect } from "next/navigation";
import { createBoard } from "@/db/queries/boards";
import { getProjectForStaff } from "@/db/queries/projects";
import { readFormId } from "@/lib/actions/form-ids";
import { failure, formValues, keptValues, type ActionResult } from "@/lib/actions/result";
import { requireApiUser } from "@/lib/auth/session";
import { createBoardSchema } from "@/lib/validation/board";

/** A new empty board in one of the project's rooms, then straight into it. The form posts the project's id. */
export async function createBoardAction(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  let projectId: string;
  let boardId: string;
  try {
    const actor = await requireApiUser("designer");
    projectId = readFormId(form, "projectId", "That project");
    await getProjectForStaff(actor, projectId);
    const input = createBoardSchema.parse(formValues(form));
    boardId = (await createBoard(actor, projectId, input)).id;
  } catch (error) {
    return failure(error, keptValues(form));
  }
  redirect(`/studio/projects/${projectId}/boards/${boardId}`);
}
