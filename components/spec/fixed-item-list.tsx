"use client";

import { useActionState, type ReactNode } from "react";
import { removeFixedItemAction } from "@/app/studio/projects/[projectId]/specification/actions";
import { FormMessage } from "@/components/auth/form-message";
import { Card, Figure, LinkButton, SubmitButton } from "@/components/ui";
import { idle, type ActionResult } from "@/lib/actions/result";
import { quantityDigits } from "@/lib/spec/group";

type FixedItem = { id: string; item: string; location: string | null; roomName: string; finishName: string; productCode: string | null; quantity: number; unit: string };
type Removal = ActionResult<{ item: string }>;

// The ids travel in hidden inputs, so the form also works before (or without) JavaScript.
function RemoveForm({ projectId, item, action }: { projectId: string; item: FixedItem; action: (form: FormData) => void }) {
  return (
    <form action={action}>
      <input type="hidden" name="projectId" value={projectId} />
      <input type="hidden" name="fixedItemId" value={item.id} />
      <SubmitButton variant="quiet" aria-label={`Remove ${item.item} (${item.roomName})`}>
        Remove
      </SubmitButton>
    </form>
  );
}

/**
 * Fixed items with their edit and remove commands; removing one changes only the current
 * specification. The removal's answer sits above the list (not beside the item), so it is still
 * there when the item has gone, or when the list is empty and `empty` shows instead.
 */
export function FixedItemList({ projectId, items, empty }: { projectId: string; items: FixedItem[]; empty: ReactNode }) {
  const [state, action] = useActionState<Removal, FormData>(removeFixedItemAction, idle);
  const removed = state.ok ? `Removed ${state.data.item} from the current specification. Issued revisions keep it.` : undefined;
  return (
    <div className="flex flex-col gap-3">
      <FormMessage state={state} success={removed} />
      {items.length === 0 ? empty : (
        <Card>
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
                  <RemoveForm projectId={projectId} item={f} action={action} />
                </span>
              </li>
            ))}
          </ul>
        </Card>
      )}
    </div>
  );
}
