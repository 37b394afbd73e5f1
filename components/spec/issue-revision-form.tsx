"use client";

import { useActionState, useState } from "react";
import { issueRevisionAction } from "@/app/studio/projects/[projectId]/specification/actions";
import { FormMessage } from "@/components/auth/form-message";
import { Button, LinkButton } from "@/components/ui";
import { idle } from "@/lib/actions/result";

type Supplier = { name: string; lineCount: number; contacts: number };

type Props = {
  projectId: string;
  nextLetter: string;
  lineCount: number;
  suppliers: Supplier[];
  disabledReason?: string | null;
  /** Open at the confirming step: the page was asked for it (`?issue=confirm`), as a browser without JavaScript does. */
  startConfirming?: boolean;
  /** The specification's address and grouping, kept when the confirming step opens or is cancelled. */
  specPath: string;
  grouping: "room" | "supplier";
};

/**
 * Issuing freezes the specification and e-mails suppliers, so it asks once more, saying exactly
 * who will hear about it, before it goes. Both steps work without JavaScript: the first is a GET
 * form that opens the second, and the project's id is posted in a hidden input.
 */
export function IssueRevisionForm({ projectId, nextLetter, lineCount, suppliers, disabledReason, startConfirming = false, specPath, grouping }: Props) {
  const [state, action, pending] = useActionState(issueRevisionAction, idle);
  const refused = !state.ok && Boolean(state.error);
  const [confirming, setConfirming] = useState(startConfirming || refused);
  if (disabledReason) {
    return (
      <div className="flex max-w-sm flex-col gap-2">
        <FormMessage state={state} />
        <p className="text-ink-soft">{disabledReason}</p>
      </div>
    );
  }
  if (!confirming) {
    return (
      <form method="get" action={`${specPath}#issue`} onSubmit={(e) => { e.preventDefault(); setConfirming(true); }}>
        {grouping === "supplier" && <input type="hidden" name="view" value="supplier" />}
        <input type="hidden" name="issue" value="confirm" />
        <Button type="submit">Issue revision {nextLetter}…</Button>
      </form>
    );
  }
  const unreachable = suppliers.filter((s) => s.contacts === 0);
  return (
    <form id="issue" action={action} className="flex max-w-md flex-col gap-3 rounded-lg border border-line-strong bg-card p-4">
      <input type="hidden" name="projectId" value={projectId} />
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
        <LinkButton href={grouping === "supplier" ? `${specPath}?view=supplier` : specPath} variant="secondary" onClick={(e) => { e.preventDefault(); setConfirming(false); }}>
          Cancel
        </LinkButton>
      </div>
    </form>
  );
}
