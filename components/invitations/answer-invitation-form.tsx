"use client";

import { useActionState } from "react";
import { answerInvitationAction } from "@/app/welcome/actions";
import { FormMessage } from "@/components/auth/form-message";
import { Button } from "@/components/ui";
import { idle } from "@/lib/actions/result";

/** Accept and Decline for one invitation: two submit buttons of one plain form. */
export function AnswerInvitationForm({ invitationId, canAccept, label }: { invitationId: string; canAccept: boolean; label: string }) {
  const [state, action, pending] = useActionState(answerInvitationAction, idle);
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
