"use client";

import { startTransition, useActionState, useState } from "react";
import { saveSupplierAction } from "@/app/studio/suppliers/actions";
import { FormMessage } from "@/components/auth/form-message";
import { Button, Card, LinkButton, useRefusedFocus } from "@/components/ui";
import { idle } from "@/lib/actions/result";
import { CompanyFields } from "./company-fields";
import { ContactRows } from "./contact-rows";
import { draftFromKept, fieldOrder, type SupplierDraft } from "./supplier-draft";

type Props = { supplierId: string | null; initial: SupplierDraft; cancelHref: string };

/**
 * Adds or changes a supplier and its contacts in one save. The id travels in a hidden input; what
 * was typed is kept in state, and without JavaScript the page is drawn again from the values a
 * refused save sends back, with the cursor in the first field to fix.
 */
export function SupplierForm({ supplierId, initial, cancelHref }: Props) {
  const [state, action, pending] = useActionState(saveSupplierAction, idle);
  const kept = state.ok ? undefined : state.values;
  const [draft, setDraft] = useState<SupplierDraft>(() => (kept ? draftFromKept(kept) : initial));
  const { formRef, autoFocus } = useRefusedFocus(state, fieldOrder(draft));
  const errors = state.ok ? undefined : state.fieldErrors;
  const change = (next: Partial<SupplierDraft>) => setDraft((d) => ({ ...d, ...next }));
  return (
    <form
      ref={formRef}
      action={action}
      noValidate
      className="flex flex-col gap-6"
      onSubmit={(e) => {
        // With JavaScript, post without React's automatic form reset: it would put a controlled
        // <select> back on its first option while the state still holds the chosen trade.
        e.preventDefault();
        const data = new FormData(e.currentTarget);
        startTransition(() => action(data));
      }}
    >
      <input type="hidden" name="supplierId" value={supplierId ?? ""} />
      <Card title="Company">
        <CompanyFields draft={draft} errors={errors} autoFocus={autoFocus} onChange={change} />
      </Card>
      <Card title="Contacts">
        <ContactRows rows={draft.contacts} errors={errors} autoFocus={autoFocus} onChange={(contacts) => change({ contacts })} />
      </Card>
      <div className="flex flex-col gap-3" aria-live="polite">
        <FormMessage state={state} />
        <div className="flex flex-wrap gap-2">
          <Button type="submit" size="lg" pending={pending}>
            {supplierId ? "Save changes" : "Add supplier"}
          </Button>
          <LinkButton href={cancelHref} variant="secondary" size="lg">
            Cancel
          </LinkButton>
        </div>
      </div>
    </form>
  );
}
