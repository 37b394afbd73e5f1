"use server";

import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { getProjectForStaff } from "@/db/queries/projects";
import { createFixedItem, deleteFixedItem, getFixedItem, updateFixedItem } from "@/db/queries/spec-fixed-items";
import { readFormId, readOptionalFormId } from "@/lib/actions/form-ids";
import { failure, formValues, keptValues, type ActionResult } from "@/lib/actions/result";
import { requireApiUser } from "@/lib/auth/session";
import { issueRevisionAndNotify } from "@/lib/spec/notify";
import { fixedItemSchema } from "@/lib/validation/spec";

// The forms post the project's and the item's ids in hidden inputs (a browser-side `.bind`
// hangs React's server renderer when the form is posted without JavaScript). Each action still
// checks the role, then access to the project, then the body.
const specPath = (projectId: string) => `/studio/projects/${projectId}/specification`;

/** Issues the next revision and opens it; errors (nothing changed, a race) come back to the form. */
export async function issueRevisionAction(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  let projectId: string;
  let revisionId: string;
  try {
    const actor = await requireApiUser("designer");
    projectId = readFormId(form, "projectId", "That project");
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

/** Adds (no fixedItemId) or changes (with one) a fixed item, then goes back to the specification. */
export async function saveFixedItemAction(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  let projectId: string;
  try {
    const actor = await requireApiUser("designer");
    projectId = readFormId(form, "projectId", "That project");
    const fixedItemId = readOptionalFormId(form, "fixedItemId", "That fixed item");
    await getProjectForStaff(actor, projectId);
    const input = fixedItemSchema.parse(formValues(form));
    if (fixedItemId) await updateFixedItem(actor, projectId, fixedItemId, input);
    else await createFixedItem(actor, projectId, input);
  } catch (error) {
    return failure(error, keptValues(form));
  }
  revalidatePath(specPath(projectId));
  redirect(`${specPath(projectId)}#fixed-items`);
}

/** Takes a fixed item out of the current specification (issued revisions keep it) and names what went. */
export async function removeFixedItemAction(_prev: ActionResult<{ item: string }>, form: FormData): Promise<ActionResult<{ item: string }>> {
  let projectId: string;
  let item: string;
  try {
    const actor = await requireApiUser("designer");
    projectId = readFormId(form, "projectId", "That project");
    const fixedItemId = readFormId(form, "fixedItemId", "That fixed item");
    item = (await getFixedItem(actor, projectId, fixedItemId)).item.item;
    await deleteFixedItem(actor, projectId, fixedItemId);
  } catch (error) {
    return failure(error);
  }
  revalidatePath(specPath(projectId));
  return { ok: true, data: { item } };
}
