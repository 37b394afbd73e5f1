"use client";

import { useActionState } from "react";
import { inviteDesignerAction } from "@/app/studio/team/actions";
import { FormMessage } from "@/components/auth/form-message";
import { TextField } from "@/components/auth/text-field";
import { Button, useRefusedFocus } from "@/components/ui";
import { idle, keptValue } from "@/lib/actions/result";

const fields = ["name", "email"] as const;

export function InviteDesignerForm() {
  const [state, action, pending] = useActionState(inviteDesignerAction, idle);
  const { formRef, autoFocus } = useRefusedFocus(state, fields);
  const errors = state.ok ? undefined : state.fieldErrors;
  const field = (name: (typeof fields)[number]) => ({ name, errors, defaultValue: keptValue(state, name), autoFocus: autoFocus(name) });
  return (
    <form ref={formRef} action={action} className="space-y-4" noValidate>
      <TextField {...field("name")} label="Name" autoComplete="off" />
      <TextField {...field("email")} label="E-mail address" type="email" autoComplete="off" />
      <FormMessage state={state} success="Invitation sent." />
      <Button type="submit" pending={pending}>
        Send invitation
      </Button>
    </form>
  );
}
