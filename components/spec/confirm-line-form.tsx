"use client";

import { useActionState } from "react";
import { confirmLineAction } from "@/app/studio/projects/[projectId]/specification/revisions/[revisionId]/actions";
import { FormMessage } from "@/components/auth/form-message";
import { Button, Textarea } from "@/components/ui";
import { idle, keptValue } from "@/lib/actions/result";

type Props = { revisionId: string; lineId: string; letter: string; item: string };

/**
 * "The issued line stands": the designer's word that a line an approved variation overtook may be
 * ordered as issued, with a note the supplier reads. Ids in hidden inputs; works without JavaScript.
 */
export function ConfirmLineForm({ revisionId, lineId, letter, item }: Props) {
  const [state, action, pending] = useActionState(confirmLineAction, idle);
  const noteId = `confirm-note-${lineId}`;
  return (
    <form action={action} className="flex flex-col gap-2">
      <input type="hidden" name="revisionId" value={revisionId} />
      <input type="hidden" name="lineId" value={lineId} />
      <label htmlFor={noteId} className="font-medium">
        Note for the supplier (optional)
      </label>
      <Textarea id={noteId} name="note" rows={2} maxLength={500} defaultValue={keptValue(state, "note")} placeholder="Why the issued line still stands" />
      <FormMessage state={state} success={`Confirmed: the supplier may order “${item}” from revision ${letter}.`} />
      <div>
        <Button type="submit" variant="secondary" pending={pending}>
          The issued line stands
        </Button>
      </div>
    </form>
  );
}
