"use client";

import { useActionState } from "react";
import { inviteDesignerAction } from "@/app/studio/team/actions";
import { FormMessage } from "@/components/auth/form-message";
import { TextField } from "@/components/auth/text-field";
import { Button } from "@/components/ui";
import { idle } from "@/lib/actions/result";

export function InviteDesignerForm() {
  const [state, action, pending] = useActionState(inviteDesignerAction, idle);
  const errors = state.ok ? undefined : state.fieldErrors;
  return (
    <form action={action} className="space-y-4" noValidate>
      <TextField name="name" label="Name" autoComplete="off" errors={errors} />
      <TextField name="email" label="E-mail address" type="email" autoComplete="off" errors={errors} />
      <FormMessage state={state} success="Invitation sent." />
      <Button type="submit" pending={pending}>
        Send invitation
      </Button>
    </form>
  );
}
