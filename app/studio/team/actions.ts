"use server";

import { revalidatePath } from "next/cache";
import { addDesigner, type DesignerInviteOutcome } from "@/db/queries/studios";
import { withdrawTeamInvitation } from "@/db/queries/studio-invitations";
import type { Actor } from "@/db/queries/users";
import { readFormId } from "@/lib/actions/form-ids";
import { failure, formValues, keptValues, type ActionResult } from "@/lib/actions/result";
import { requireApiUser } from "@/lib/auth/session";
import { invitationMessage, studioInvitationMessage } from "@/lib/mail/messages";
import { appUrl, sendMail } from "@/lib/mail/send";
import { inviteDesignerSchema } from "@/lib/validation/auth";

/** The same words whichever e-mail went out: the owner never learns whether the address had an account. */
const DESIGNER_MAIL_FAILED =
  "Invited, but the e-mail could not be sent: the mail server did not answer. Send the invitation again later.";

/** Where the e-mail leads: sign in with this address, then the account page (new) or the invitation (account holder). */
function signInUrl(outcome: DesignerInviteOutcome) {
  const callbackUrl = outcome.kind === "added" ? "/account" : "/welcome";
  return appUrl(`/sign-in?${new URLSearchParams({ email: outcome.email, callbackUrl }).toString()}`);
}

/** The invitation, either kind; false when the mail server failed. */
async function emailDesigner(actor: Actor, outcome: DesignerInviteOutcome): Promise<boolean> {
  const common = { url: signInUrl(outcome), studioName: actor.studio?.name ?? "", inviterName: actor.name ?? actor.email };
  const message = outcome.kind === "added" ? invitationMessage({ ...common, role: "designer" }) : studioInvitationMessage(common);
  try {
    await sendMail({ to: outcome.email, ...message });
    return true;
  } catch (error) {
    console.error(`could not e-mail the team invitation to ${outcome.email}:`, error);
    return false;
  }
}

/**
 * Owners only: invites a designer and e-mails them a way in. A new address joins the staff list
 * as "Invited, not joined yet"; an address that already has an account gets an invitation to
 * accept, listed the same way. The owner sees "Invitation sent" either way.
 */
export async function inviteDesignerAction(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  try {
    const actor = await requireApiUser("owner");
    const input = inviteDesignerSchema.parse(formValues(form));
    const outcome = await addDesigner(actor.studio?.id ?? "", actor.userId, input);
    revalidatePath("/studio/team");
    if (!(await emailDesigner(actor, outcome))) return { ok: false, error: DESIGNER_MAIL_FAILED, status: 502, values: keptValues(form) };
    return { ok: true, data: undefined };
  } catch (error) {
    return failure(error, keptValues(form));
  }
}

/** Owners only: "Withdraw invitation" for anyone listed as not joined yet (the entry's id in a hidden input). */
export async function withdrawTeamInvitationAction(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  try {
    const actor = await requireApiUser("owner");
    const entryId = readFormId(form, "entryId", "That invitation");
    await withdrawTeamInvitation(actor, entryId);
    revalidatePath("/studio/team");
    return { ok: true, data: undefined };
  } catch (error) {
    return failure(error);
  }
}
