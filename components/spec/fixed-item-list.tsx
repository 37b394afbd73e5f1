"use client";

import { useActionState } from "react";
import { removeFixedItemAction } from "@/app/studio/projects/[projectId]/specification/actions";
import { FormMessage } from "@/components/auth/form-message";
import { Button, Figure, LinkButton } from "@/components/ui";
import { idle } from "@/lib/actions/result";
import { quantityDigits } from "@/lib/spec/group";

type FixedItem = { id: string; item: string; location: string | null; roomName: string; finishName: string; productCode: string | null; quantity: number; unit: string };

function RemoveButton({ projectId, item }: { projectId: string; item: FixedItem }) {
  const [state, action, pending] = useActionState(removeFixedItemAction.bind(null, projectId, item.id), idle);
  return (
    <form action={action} className="flex flex-col items-end gap-1">
      <Button type="submit" variant="quiet" pending={pending} aria-label={`Remove ${item.item} (${item.roomName})`}>
        Remove
      </Button>
      <FormMessage state={state} />
    </form>
  );
}

/** Fixed items with their edit and remove commands; removing one changes only the current specification. */
export function FixedItemList({ projectId, items }: { projectId: string; items: FixedItem[] }) {
  return (
    <ul className="divide-y divide-line">
      {items.map((f) => (
        <li key={f.id} className="flex flex-col gap-2 py-3 sm:flex-row sm:items-center sm:justify-between">
          <span>
            <span className="font-medium">{f.item}</span> <span className="text-ink-soft">· {f.roomName}{f.location ? `, ${f.location}` : ""}</span>
            <span className="block text-ink-soft">
              {f.finishName}
              {f.productCode ? ` (${f.productCode})` : ""} · <Figure value={f.quantity} digits={quantityDigits(f.quantity)} unit={f.unit} />
            </span>
          </span>
          <span className="flex items-start gap-1">
            <LinkButton href={`/studio/projects/${projectId}/specification/fixed-items/${f.id}`} variant="secondary" aria-label={`Change ${f.item} (${f.roomName})`}>
              Change
            </LinkButton>
            <RemoveButton projectId={projectId} item={f} />
          </span>
        </li>
      ))}
    </ul>
  );
}
