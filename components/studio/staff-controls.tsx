"use client";

import { useActionState } from "react";
import { changeStaffRoleAction, removeStaffAction } from "@/app/studio/team/staff-actions";
import { FormMessage } from "@/components/auth/form-message";
import { Button } from "@/components/ui";
import { idle } from "@/lib/actions/result";

type Props = { person: { userId: string; name: string; role: "owner" | "designer" } };

/** The owner's "Change or remove" for one person on the staff. Either change signs them out at once. */
export function StaffControls({ person }: Props) {
  const [roleState, roleAction, changing] = useActionState(changeStaffRoleAction, idle);
  const [removeState, removeAction, removing] = useActionState(removeStaffAction, idle);
  const to = person.role === "owner" ? "designer" : "owner";
  return (
    <details className="w-full rounded-md border border-line bg-card">
      <summary className="flex min-h-tap cursor-pointer items-center px-3 font-medium text-spruce">Change or remove {person.name}</summary>
      <div className="flex flex-col gap-4 border-t border-line p-3">
        <form action={roleAction} className="flex flex-col gap-2">
          <input type="hidden" name="userId" value={person.userId} />
          <input type="hidden" name="role" value={to} />
          <p className="text-sm text-ink-soft">
            {to === "owner" ? "An owner also manages the team and the studio's settings." : "A designer runs projects and keeps the library, but can't manage the team or settings."}
          </p>
          <Button type="submit" variant="secondary" pending={changing} className="self-start">
            {to === "owner" ? "Make owner" : "Make designer"}
          </Button>
          <FormMessage state={roleState} />
        </form>
        <form action={removeAction} className="flex flex-col gap-2 border-t border-line pt-3">
          <input type="hidden" name="userId" value={person.userId} />
          <p className="text-sm text-ink-soft">They lose access to the studio at once. Their account and everything they did stay recorded.</p>
          <Button type="submit" variant="danger" pending={removing} className="self-start">
            Remove from studio
          </Button>
          <FormMessage state={removeState} />
        </form>
      </div>
    </details>
  );
}
