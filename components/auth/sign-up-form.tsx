"use client";

import { useActionState } from "react";
import { signUp } from "@/app/(public)/sign-up/actions";
import { FormMessage } from "@/components/auth/form-message";
import { TextField } from "@/components/auth/text-field";
import { Button } from "@/components/ui";
import { idle } from "@/lib/actions/result";

export function SignUpForm() {
  const [state, action, pending] = useActionState(signUp, idle);
  const errors = state.ok ? undefined : state.fieldErrors;
  return (
    <form action={action} className="space-y-4 rounded-lg border border-line bg-card p-5" noValidate>
      <TextField name="studioName" label="Studio name" autoComplete="organization" errors={errors} />
      <TextField name="name" label="Your name" autoComplete="name" errors={errors} />
      <TextField name="email" label="E-mail address" type="email" autoComplete="email" errors={errors} />
      <TextField
        name="password"
        label="Password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
        errors={errors}
      />
      <FormMessage state={state} />
      <Button type="submit" size="lg" pending={pending} className="w-full">
        Create the studio
      </Button>
    </form>
  );
}
