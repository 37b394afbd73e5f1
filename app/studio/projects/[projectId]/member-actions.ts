"use server";

import { revalidatePath } from "next/cache";
import { changeMemberRole, getMemberForStaff, removeMember, withdrawPending } from "@/db/queries/members";
import { readFormId } from "@/lib/actions/form-ids";
import { failure, formValues, type ActionResult } from "@/lib/actions/result";
import { requireApiUser } from "@/lib/auth/session";
import { memberRoleSchema } from "@/lib/validation/member";
import { inviteeFromForm } from "@/lib/validation/project-invite";

/** "Make client" / "Make contact at <supplier>": the button pressed carries `to` ("client" or "supplier:<id>"). */
export async function changeMemberRoleAction(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  try {
    const actor = await requireApiUser("designer");
    const projectId = readFormId(form, "projectId", "That project");
    const userId = readFormId(form, "userId", "That person");
    await getMemberForStaff(actor, projectId, userId);
    const { role, supplierId } = inviteeFromForm({ who: formValues(form).to });
    const input = memberRoleSchema.parse(role === "supplier" ? { role, supplierId } : { role });
    await changeMemberRole(actor, projectId, userId, input);
    revalidatePath(`/studio/projects/${projectId}`);
    return { ok: true, data: undefined };
  } catch (error) {
    return failure(error);
  }
}

/** "Remove from project": their past picks and approvals stay recorded. */
export async function removeMemberAction(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  try {
    const actor = await requireApiUser("designer");
    const projectId = readFormId(form, "projectId", "That project");
    const userId = readFormId(form, "userId", "That person");
    await removeMember(actor, projectId, userId);
    revalidatePath(`/studio/projects/${projectId}`);
    return { ok: true, data: undefined };
  } catch (error) {
    return failure(error);
  }
}

/** "Withdraw invitation", for anyone listed as not joined yet (the same form whichever kind they are). */
export async function withdrawInvitationAction(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  try {
    const actor = await requireApiUser("designer");
    const projectId = readFormId(form, "projectId", "That project");
    const entryId = readFormId(form, "entryId", "That invitation");
    await withdrawPending(actor, projectId, entryId);
    revalidatePath(`/studio/projects/${projectId}`);
    return { ok: true, data: undefined };
  } catch (error) {
    return failure(error);
  }
}
