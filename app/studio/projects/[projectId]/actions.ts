"use server";

import { revalidatePath } from "next/cache";
import { updateProject } from "@/db/queries/project-edits";
import { inviteToProject } from "@/db/queries/project-invite";
import { getProjectForStaff } from "@/db/queries/projects";
import { readFormId } from "@/lib/actions/form-ids";
import { failure, formValues, keptValues, type ActionResult } from "@/lib/actions/result";
import { requireApiUser } from "@/lib/auth/session";
import { emailInvitation } from "@/lib/invitations/email-invitation";
import { editProjectSchema } from "@/lib/validation/project";
import { inviteeFromForm, projectInviteeSchema } from "@/lib/validation/project-invite";

/** The form's state: the outcome (with what was typed, after a refusal) and a count of sends. */
export type InviteState = ActionResult & { attempt?: number };

/** The same words whether the address was new, had an account, or belongs to another studio's staff. */
const MAIL_FAILED =
  "Invitation saved, but the invitation e-mail could not be sent: the mail server did not answer. They're listed as invited; send the invitation again later.";

/**
 * A designer invites a client or a supplier's contact. The project id comes in the form (checked
 * here like every other field), so the form works with JavaScript off.
 */
export async function inviteToProjectAction(prev: InviteState, form: FormData): Promise<InviteState> {
  const values = keptValues(form);
  const attempt = (prev.attempt ?? 0) + 1;
  try {
    const actor = await requireApiUser("designer");
    const projectId = readFormId(form, "projectId", "That project");
    // Another studio's project answers 404 before anything the form says is looked at.
    await getProjectForStaff(actor, projectId);
    const input = projectInviteeSchema.parse(inviteeFromForm(formValues(form)));
    const outcome = await inviteToProject(actor, projectId, input);
    revalidatePath(`/studio/projects/${projectId}`);
    if (!(await emailInvitation(actor, outcome, input.role))) return { ok: false, error: MAIL_FAILED, status: 502, values, attempt };
    return { ok: true, data: undefined, attempt };
  } catch (error) {
    const result = failure(error, values);
    return { ...result, fieldErrors: onFormFields(result.fieldErrors), attempt };
  }
}

/** The role and the supplier are one choice on the form ("They are"): their errors show there. */
function onFormFields(errors: Record<string, string[]> | undefined) {
  if (!errors) return undefined;
  const { role, supplierId, ...rest } = errors;
  const who = [...(role ?? []), ...(supplierId ?? [])];
  return who.length ? { ...rest, who } : rest;
}

/** "Edit project": name, site address and install date (empty clears the last two). */
export async function editProjectAction(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  const values = keptValues(form);
  try {
    const actor = await requireApiUser("designer");
    const projectId = readFormId(form, "projectId", "That project");
    await getProjectForStaff(actor, projectId);
    const { name, siteAddress, installDate } = formValues(form);
    await updateProject(actor, projectId, editProjectSchema.parse({ name: name ?? "", siteAddress: siteAddress ?? "", installDate: installDate ?? "" }));
    revalidatePath(`/studio/projects/${projectId}`, "layout");
    return { ok: true, data: undefined };
  } catch (error) {
    return failure(error, values);
  }
}
