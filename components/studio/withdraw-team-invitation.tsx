"use client";

import { useActionState } from "react";
import { withdrawTeamInvitationAction } from "@/app/studio/team/actions";
import { FormMessage } from "@/components/auth/form-message";
import { Button } from "@/components/ui";
import { idle } from "@/lib/actions/result";

/**
 * The owner's one control for anyone invited who hasn't joined yet, whichever kind of invitation
 * they have: the entry's id goes in a hidden input (works with JavaScript off).
 */
export function WithdrawTeamInvitation({ entryId, name }: { entryId: string; name: string }) {
  const [state, action, pending] = useActionState(withdrawTeamInvitationAction, idle);
  return (
    <form action={action} className="flex flex-col items-end gap-2">
      <input type="hidden" name="entryId" value={entryId} />
      <Button type="submit" variant="quiet" pending={pending} aria-label={`Withdraw invitation: ${name}`}>
        Withdraw invitation
      </Button>
      <FormMessage state={state} />
    </form>
  );
}
