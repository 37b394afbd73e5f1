"use server";

import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { z } from "zod";
import { answerInvitation } from "@/db/queries/invitations";
import { answerStudioInvitation } from "@/db/queries/studio-invitations";
import { failure, formValues, type ActionResult } from "@/lib/actions/result";
import { requireApiUser } from "@/lib/auth/session";

const answerSchema = z.object({
  invitationId: z.string({ error: "That invitation was not found." }).trim().min(1, "That invitation was not found.").max(100),
  answer: z.enum(["accept", "decline"], { error: "Choose Accept or Decline." }),
});

/**
 * The invited person accepts or declines a project invitation (a plain form post: works with
 * JavaScript off). Only the person the invitation was sent to may answer it. Then home, where an
 * accepted project now shows.
 */
export async function answerInvitationAction(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  try {
    const actor = await requireApiUser();
    const { invitationId, answer } = answerSchema.parse(formValues(form));
    await answerInvitation(actor, invitationId, answer);
  } catch (error) {
    return failure(error);
  }
  revalidatePath("/", "layout");
  redirect("/home");
}

/**
 * The invited person accepts or declines an invitation to a studio's team (a plain form post).
 * Only the person it was sent to may answer it (404 for anyone else); someone already on another
 * studio's team is refused Accept with the reason, shown only to them. Then home: the studio's
 * screens once they have joined.
 */
export async function answerStudioInvitationAction(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  try {
    const actor = await requireApiUser();
    const { invitationId, answer } = answerSchema.parse(formValues(form));
    await answerStudioInvitation(actor, invitationId, answer);
  } catch (error) {
    return failure(error);
  }
  revalidatePath("/", "layout");
  redirect("/home");
}
