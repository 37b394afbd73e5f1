"use client";

import { useActionState } from "react";
import { archiveSupplierAction, deleteSupplierAction } from "@/app/studio/suppliers/actions";
import { FormMessage } from "@/components/auth/form-message";
import { Button, Card, useRefusedFocus } from "@/components/ui";
import { idle } from "@/lib/actions/result";

type Props = { supplierId: string; archived: boolean; deleteBlock: string | null };

/**
 * Archive keeps a supplier on everything that names it and offers it nowhere new. Delete is only
 * for a supplier nothing names (a mistaken entry), and asks for a tick first: a form without
 * JavaScript can't pop up a confirmation.
 */
export function SupplierRemoval({ supplierId, archived, deleteBlock }: Props) {
  const [archiveState, archiveAction, archiving] = useActionState(archiveSupplierAction, idle);
  const [deleteState, deleteAction, deleting] = useActionState(deleteSupplierAction, idle);
  const { formRef, autoFocus } = useRefusedFocus(deleteState, ["confirm"]);
  const confirmError = deleteState.ok ? undefined : deleteState.fieldErrors?.confirm?.[0];
  return (
    <Card title={archived ? "Archived" : "Archive or delete"} level={2}>
      <div className="flex flex-col gap-4">
        <form action={archiveAction} className="flex flex-col gap-3">
          <input type="hidden" name="supplierId" value={supplierId} />
          <input type="hidden" name="archived" value={archived ? "0" : "1"} />
          <p className="text-ink-soft">
            {archived
              ? "Kept on the finishes, specifications and projects that name it, but not offered for new finishes or invitations."
              : "Archiving keeps it on everything that names it and stops offering it for new finishes and project invitations."}
          </p>
          <Button type="submit" variant="secondary" pending={archiving}>
            {archived ? "Bring back" : "Archive this supplier"}
          </Button>
          <FormMessage state={archiveState} />
        </form>
        {deleteBlock ? (
          <p className="text-sm text-stone-600">{deleteBlock}</p>
        ) : (
          <form ref={formRef} action={deleteAction} noValidate className="flex flex-col gap-3 border-t border-line pt-4">
            <input type="hidden" name="supplierId" value={supplierId} />
            <p className="text-ink-soft">Nothing names this supplier yet, so it can be deleted. This can&apos;t be undone.</p>
            {confirmError && (
              <p id="supplier-confirm-error" className="text-sm font-medium text-problem-ink">
                {confirmError}
              </p>
            )}
            <label className="flex min-h-tap cursor-pointer items-center gap-3">
              <input
                type="checkbox"
                name="confirm"
                value="yes"
                className="size-5"
                aria-invalid={confirmError ? true : undefined}
                aria-describedby={confirmError ? "supplier-confirm-error" : undefined}
                autoFocus={autoFocus("confirm")}
              />
              <span>Yes, delete it for good</span>
            </label>
            <Button type="submit" variant="danger" pending={deleting}>
              Delete supplier
            </Button>
            {!confirmError && <FormMessage state={deleteState} />}
          </form>
        )}
      </div>
    </Card>
  );
}
