"use server";

import { revalidatePath } from "next/cache";
import { addDesigner, type DesignerInviteOutcome } from "@/db/queries/studios";
import type { Actor } from "@/db/queries/users";
import { failure, formValues, keptValues, type ActionResult } from "@/lib/actions/result";
import { requireApiUser } from "@/lib/auth/session";
import { invitationMessage, staffAddressTakenMessage } from "@/lib/mail/messages";
import { appUrl, sendMail } from "@/lib/mail/send";
import { inviteDesignerSchema } from "@/lib/validation/auth";

/** The same words whichever e-mail went out: the owner never learns whether the address had an account. */
const DESIGNER_MAIL_FAILED =
  "Added, but the e-mail could not be sent: the mail server did not answer. Send the invitation again later.";

/** The invitation (or, for an address with an account, the note); false when the mail server failed. */
async function emailDesigner(actor: Actor, outcome: DesignerInviteOutcome): Promise<boolean> {
  const studioName = actor.studio?.name ?? "";
  const inviterName = actor.name ?? actor.email;
  // After the e-mailed link, the account page, where a new designer sets a password.
  const url = appUrl(`/sign-in?${new URLSearchParams({ email: outcome.email, callbackUrl: "/account" }).toString()}`);
  const message =
    outcome.kind === "added"
      ? invitationMessage({ url, studioName, inviterName, role: "designer" })
      : staffAddressTakenMessage({ studioName, inviterName, signInUrl: appUrl("/sign-in") });
  try {
    await sendMail({ to: outcome.email, ...message });
    return true;
  } catch (error) {
    console.error(`could not e-mail the team invitation to ${outcome.email}:`, error);
    return false;
  }
}

/**
 * Owners only: adds a designer and e-mails them a way in. An address that already has an account
 * is added to nothing and sent a note instead; the owner sees "Invitation sent" either way.
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
