"use server";

import { revalidatePath } from "next/cache";
import { confirmLineStands } from "@/db/queries/spec-handoff";
import { readFormId } from "@/lib/actions/form-ids";
import { failure, formValues, keptValues, type ActionResult } from "@/lib/actions/result";
import { requireApiUser } from "@/lib/auth/session";
import { lineConfirmationSchema } from "@/lib/validation/line-confirmation";

/**
 * "The issued line stands": the revision's and the line's ids come in hidden inputs (no `.bind`
 * in the browser, see DEVELOPERS.md); the role is checked first, then access to the revision
 * (confirmLineStands), then the note.
 */
export async function confirmLineAction(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  try {
    const actor = await requireApiUser("designer");
    const revisionId = readFormId(form, "revisionId", "That revision");
    const lineId = readFormId(form, "lineId", "That line");
    const input = lineConfirmationSchema.parse({ note: formValues(form).note ?? "" });
    await confirmLineStands(actor, revisionId, lineId, input);
  } catch (error) {
    return failure(error, keptValues(form));
  }
  revalidatePath("/studio/projects", "layout");
  return { ok: true, data: undefined };
}
