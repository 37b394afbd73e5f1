"use client";

import { useActionState, useRef } from "react";
import { signUp } from "@/app/(public)/sign-up/actions";
import { FormMessage } from "@/components/auth/form-message";
import { TextField } from "@/components/auth/text-field";
import { fieldToFix, useFocusProblem } from "@/components/auth/use-focus-problem";
import { Button } from "@/components/ui";
import { idle, keptValue, type ActionResult } from "@/lib/actions/result";

const ORDER = ["studioName", "name", "email", "password"];

export function SignUpForm() {
  const [state, action, pending] = useActionState<ActionResult, FormData>(signUp, idle);
  const form = useRef<HTMLFormElement>(null);
  const errors = state.ok ? undefined : state.fieldErrors;
  const fix = fieldToFix(state, ORDER);
  useFocusProblem(form, state, fix);
  return (
    <form ref={form} action={action} className="space-y-4 rounded-lg border border-line bg-card p-5" noValidate>
      <TextField name="studioName" label="Studio name" autoComplete="organization" errors={errors} defaultValue={keptValue(state, "studioName")} autoFocus={fix === "studioName"} />
      <TextField name="name" label="Your name" autoComplete="name" errors={errors} defaultValue={keptValue(state, "name")} autoFocus={fix === "name"} />
      <TextField
        name="email"
        label="E-mail address"
        type="email"
        autoComplete="email"
        errors={errors}
        defaultValue={keptValue(state, "email")}
        autoFocus={fix === "email"}
      />
      <TextField
        name="password"
        label="Password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
        errors={errors}
        autoFocus={fix === "password"}
      />
      <FormMessage state={state} />
      <Button type="submit" size="lg" pending={pending} className="w-full">
        Create the studio
      </Button>
    </form>
  );
}
