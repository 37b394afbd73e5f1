"use server";

import { redirect } from "next/navigation";
import { createBoard } from "@/db/queries/boards";
import { failure, formValues, type ActionResult } from "@/lib/actions/result";
import { requireApiUser } from "@/lib/auth/session";
import { createBoardSchema } from "@/lib/validation/board";
import { getProjectForStaff } from "@/db/queries/projects";

/** A new empty board in one of the project's rooms, then straight into it. */
export async function createBoardAction(projectId: string, _prev: ActionResult, form: FormData): Promise<ActionResult> {
  let boardId: string;
  try {
    const actor = await requireApiUser("designer");
    await getProjectForStaff(actor, projectId);
    const input = createBoardSchema.parse(formValues(form));
    boardId = (await createBoard(actor, projectId, input)).id;
  } catch (error) {
    return failure(error);
  }
  redirect(`/studio/projects/${projectId}/boards/${boardId}`);
}
