"use server";

import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { createFixedItem, deleteFixedItem, updateFixedItem } from "@/db/queries/spec-fixed-items";
import { failure, formValues, type ActionResult } from "@/lib/actions/result";
import { requireApiUser } from "@/lib/auth/session";
import { issueRevisionAndNotify } from "@/lib/spec/notify";
import { fixedItemSchema } from "@/lib/validation/spec";
import { getProjectForStaff } from "@/db/queries/projects";

const specPath = (projectId: string) => `/studio/projects/${projectId}/specification`;

/** Issues the next revision and opens it; errors (nothing changed, a race) come back to the form. */
export async function issueRevisionAction(projectId: string, _prev: ActionResult, _form: FormData): Promise<ActionResult> {
  let revisionId: string;
  try {
    const actor = await requireApiUser("designer");
    await getProjectForStaff(actor, projectId);
    const issued = await issueRevisionAndNotify(actor, projectId);
    revisionId = issued.revision.id;
  } catch (error) {
    return failure(error);
  }
  revalidatePath(specPath(projectId));
  revalidatePath(`/studio/projects/${projectId}/handoff`);
  redirect(`${specPath(projectId)}/revisions/${revisionId}`);
}

/** Adds (no id) or changes (with an id) a fixed item, then goes back to the specification. */
export async function saveFixedItemAction(projectId: string, fixedItemId: string | null, _prev: ActionResult, form: FormData): Promise<ActionResult> {
  try {
    const actor = await requireApiUser("designer");
    await getProjectForStaff(actor, projectId);
    const input = fixedItemSchema.parse(formValues(form));
    if (fixedItemId) await updateFixedItem(actor, projectId, fixedItemId, input);
    else await createFixedItem(actor, projectId, input);
  } catch (error) {
    return failure(error);
  }
  revalidatePath(specPath(projectId));
  redirect(`${specPath(projectId)}#fixed-items`);
}

export async function removeFixedItemAction(projectId: string, fixedItemId: string, _prev: ActionResult, _form: FormData): Promise<ActionResult> {
  try {
    const actor = await requireApiUser("designer");
    await deleteFixedItem(actor, projectId, fixedItemId);
  } catch (error) {
    return failure(error);
  }
  revalidatePath(specPath(projectId));
  return { ok: true, data: undefined };
}
