"use server";

import { revalidatePath } from "next/cache";
import { addProjectMember, getProjectForStaff } from "@/db/queries/projects";
import { failure, formValues, type ActionResult } from "@/lib/actions/result";
import { requireApiUser } from "@/lib/auth/session";
import { invitationMessage } from "@/lib/mail/messages";
import { appUrl, sendMail } from "@/lib/mail/send";
import { inviteToProjectSchema } from "@/lib/validation/auth";

export async function inviteToProjectAction(projectId: string, _prev: ActionResult, form: FormData): Promise<ActionResult> {
  try {
    const actor = await requireApiUser("designer");
    await getProjectForStaff(actor, projectId);
    const input = inviteToProjectSchema.parse(formValues(form));
    const { project, user } = await addProjectMember(actor, projectId, input);
    const url = appUrl(`/sign-in?email=${encodeURIComponent(user.email)}`);
    await sendMail({
      to: user.email,
      ...invitationMessage({
        url,
        studioName: actor.studio?.name ?? "Your designer",
        inviterName: actor.name ?? actor.email,
        role: input.role,
        projectName: project.name,
      }),
    });
    revalidatePath(`/studio/projects/${projectId}`);
    return { ok: true, data: undefined };
  } catch (error) {
    return failure(error);
  }
}
