"use client";

import { useActionState } from "react";
import { setPasswordAction } from "@/app/account/actions";
import { FormMessage } from "@/components/auth/form-message";
import { TextField } from "@/components/auth/text-field";
import { Button, useRefusedFocus } from "@/components/ui";
import { idle, type ActionResult } from "@/lib/actions/result";

const fields = ["currentPassword", "newPassword", "repeatPassword"] as const;
const start: ActionResult<"set" | "changed"> = idle;

/** Sets a first password (after signing in by e-mailed link) or changes one, checking the current one. */
export function PasswordForm({ hasPassword }: { hasPassword: boolean }) {
  const [state, action, pending] = useActionState(setPasswordAction, start);
  const { formRef, autoFocus } = useRefusedFocus(state, fields);
  const errors = state.ok ? undefined : state.fieldErrors;
  const field = (key: (typeof fields)[number]) => ({ name: key, id: `password-${key}`, errors, type: "password", autoFocus: autoFocus(key) });
  const changing = hasPassword || (state.ok && state.data === "set");
  const success = state.ok ? (state.data === "set" ? "Password set. Next time you can sign in with it." : "Password changed.") : undefined;
  return (
    <form ref={formRef} action={action} className="space-y-4" noValidate>
      {changing ? <TextField {...field("currentPassword")} label="Current password" autoComplete="current-password" /> : null}
      <TextField {...field("newPassword")} label="New password" autoComplete="new-password" hint="At least 10 characters." />
      <TextField {...field("repeatPassword")} label="New password again" autoComplete="new-password" />
      <FormMessage state={state} success={success} />
      <Button type="submit" pending={pending}>
        {changing ? "Change password" : "Set password"}
      </Button>
    </form>
  );
}
