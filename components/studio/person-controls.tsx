"use client";

import { useActionState } from "react";
import { changeMemberRoleAction, removeMemberAction, withdrawInvitationAction } from "@/app/studio/projects/[projectId]/member-actions";
import { FormMessage } from "@/components/auth/form-message";
import { Button } from "@/components/ui";
import { idle } from "@/lib/actions/result";
import { whoValue } from "@/lib/validation/project-invite";

type Supplier = { id: string; name: string };
type Props = {
  projectId: string;
  person: { id: string; userId: string | null; name: string; role: "client" | "supplier"; supplierId: string | null; joined: boolean };
  suppliers: Supplier[];
};

const summaryClasses = "flex min-h-tap cursor-pointer items-center px-3 font-medium text-spruce";

/**
 * "Change or remove" for someone on the project. Anyone not joined yet (whichever kind of
 * invitation they have) is offered only "Withdraw invitation", so the list shows nothing that
 * tells whether an address already had an account.
 */
export function PersonControls({ projectId, person, suppliers }: Props) {
  const [roleState, roleAction, moving] = useActionState(changeMemberRoleAction, idle);
  const [removeState, removeAction, removing] = useActionState(removeMemberAction, idle);
  const [withdrawState, withdrawAction, withdrawing] = useActionState(withdrawInvitationAction, idle);
  if (!person.joined || !person.userId) {
    return (
      <form action={withdrawAction} className="flex flex-col items-end gap-2">
        <input type="hidden" name="projectId" value={projectId} />
        <input type="hidden" name="entryId" value={person.id} />
        <Button type="submit" variant="quiet" pending={withdrawing}>
          Withdraw invitation
        </Button>
        <FormMessage state={withdrawState} />
      </form>
    );
  }
  const targets = suppliers.filter((s) => !(person.role === "supplier" && person.supplierId === s.id));
  return (
    <details className="w-full rounded-md border border-line bg-card">
      <summary className={summaryClasses}>Change or remove {person.name}</summary>
      <div className="flex flex-col gap-4 border-t border-line p-3">
        <form action={roleAction} className="flex flex-col gap-2">
          <input type="hidden" name="projectId" value={projectId} />
          <input type="hidden" name="userId" value={person.userId} />
          <p className="text-sm text-ink-soft">They are signed out at once and see the project as their new role from their next visit.</p>
          <div className="flex flex-wrap gap-2">
            {person.role === "supplier" ? (
              <Button type="submit" name="to" value="client" variant="secondary" pending={moving}>
                Make client
              </Button>
            ) : null}
            {targets.map((s) => (
              <Button key={s.id} type="submit" name="to" value={whoValue("supplier", s.id)} variant="secondary" disabled={moving}>
                Make contact at {s.name}
              </Button>
            ))}
          </div>
          <FormMessage state={roleState} />
        </form>
        <form action={removeAction} className="flex flex-col gap-2 border-t border-line pt-3">
          <input type="hidden" name="projectId" value={projectId} />
          <input type="hidden" name="userId" value={person.userId} />
          <p className="text-sm text-ink-soft">They lose access at once. What they chose and approved stays recorded.</p>
          <Button type="submit" variant="danger" pending={removing} className="self-start">
            Remove from project
          </Button>
          <FormMessage state={removeState} />
        </form>
      </div>
    </details>
  );
}
