import "server-only";
import type { InviteOutcome } from "@/db/queries/project-invite";
import type { Actor } from "@/db/queries/users";
import { invitationMessage, projectInvitationMessage } from "@/lib/mail/messages";
import { appUrl, sendMail } from "@/lib/mail/send";

/** Where the invitation e-mail leads: sign in with this address, then the pending invitations. */
function signInUrl(email: string, kind: InviteOutcome["kind"]) {
  const query = new URLSearchParams({ email });
  if (kind === "invited") query.set("callbackUrl", "/welcome");
  return appUrl(`/sign-in?${query.toString()}`);
}

/**
 * Sends the invitation, waiting for the mail server's answer so the designer is told the truth.
 * Resolves false (and logs why) when it could not be sent; the saved invitation stays either way.
 */
export async function emailInvitation(actor: Actor, outcome: InviteOutcome, role: "client" | "supplier"): Promise<boolean> {
  const common = {
    url: signInUrl(outcome.email, outcome.kind),
    studioName: actor.studio?.name ?? "Your designer",
    inviterName: actor.name ?? actor.email,
    role,
    projectName: outcome.project.name,
  };
  try {
    await sendMail({ to: outcome.email, ...(outcome.kind === "invited" ? projectInvitationMessage(common) : invitationMessage(common)) });
    return true;
  } catch (error) {
    console.error(`could not e-mail the invitation to ${outcome.email}:`, error);
    return false;
  }
}
