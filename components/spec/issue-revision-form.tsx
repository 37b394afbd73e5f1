"use client";

import { useActionState, useState } from "react";
import { issueRevisionAction } from "@/app/studio/projects/[projectId]/specification/actions";
import { FormMessage } from "@/components/auth/form-message";
import { Button } from "@/components/ui";
import { idle } from "@/lib/actions/result";

type Supplier = { name: string; lineCount: number; contacts: number };

type Props = { projectId: string; nextLetter: string; lineCount: number; suppliers: Supplier[]; disabledReason?: string | null };

/**
 * Issuing freezes the specification and e-mails suppliers, so it asks once more, saying exactly
 * who will hear about it, before it goes.
 */
export function IssueRevisionForm({ projectId, nextLetter, lineCount, suppliers, disabledReason }: Props) {
  const [state, action, pending] = useActionState(issueRevisionAction.bind(null, projectId), idle);
  const [confirming, setConfirming] = useState(false);
  if (disabledReason) return <p className="max-w-sm text-ink-soft">{disabledReason}</p>;
  if (!confirming) {
    return (
      <Button type="button" onClick={() => setConfirming(true)}>
        Issue revision {nextLetter}…
      </Button>
    );
  }
  const unreachable = suppliers.filter((s) => s.contacts === 0);
  return (
    <form action={action} className="flex max-w-md flex-col gap-3 rounded-lg border border-line-strong bg-card p-4">
      <p className="font-medium">
        Issue revision {nextLetter} with {lineCount} {lineCount === 1 ? "line" : "lines"}?
      </p>
      <p className="text-ink-soft">
        It can&apos;t be changed afterwards. Each supplier below gets an e-mail with a link to their own lines.
      </p>
      <ul className="list-disc pl-5 text-ink-soft">
        {suppliers.map((s) => (
          <li key={s.name}>
            {s.name}: {s.lineCount} {s.lineCount === 1 ? "line" : "lines"}
            {s.contacts === 0 ? " (no contact on this project)" : ""}
          </li>
        ))}
      </ul>
      {unreachable.length > 0 && (
        <p className="text-sm text-caution-ink">Suppliers with no contact on the project won&apos;t be e-mailed: invite them from the project&apos;s overview.</p>
      )}
      <FormMessage state={state} />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" pending={pending}>
          Issue revision {nextLetter}
        </Button>
        <Button type="button" variant="secondary" onClick={() => setConfirming(false)} disabled={pending}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
