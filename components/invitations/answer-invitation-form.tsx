"use client";

import { useActionState } from "react";
import { answerInvitationAction, answerStudioInvitationAction } from "@/app/welcome/actions";
import { FormMessage } from "@/components/auth/form-message";
import { Button } from "@/components/ui";
import { idle } from "@/lib/actions/result";

type Props = { invitationId: string; canAccept: boolean; label: string; kind?: "project" | "studio" };

/** Accept and Decline for one invitation (to a project, or to a studio's team): two submit buttons of one plain form. */
export function AnswerInvitationForm({ invitationId, canAccept, label, kind = "project" }: Props) {
  const [state, action, pending] = useActionState(kind === "studio" ? answerStudioInvitationAction : answerInvitationAction, idle);
  return (
    <form action={action} className="space-y-3">
      <input type="hidden" name="invitationId" value={invitationId} />
      <FormMessage state={state} />
      <div className="flex flex-wrap gap-2">
        {canAccept ? (
          <Button type="submit" name="answer" value="accept" disabled={pending} aria-label={`Accept: ${label}`}>
            Accept
          </Button>
        ) : null}
        <Button type="submit" name="answer" value="decline" variant="secondary" disabled={pending} aria-label={`Decline: ${label}`}>
          Decline
        </Button>
      </div>
    </form>
  );
}
