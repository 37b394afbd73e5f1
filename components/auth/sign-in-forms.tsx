"use client";

import { useActionState, useRef } from "react";
import { requestSignInLink, signInWithPassword } from "@/app/(public)/sign-in/actions";
import { FormMessage } from "@/components/auth/form-message";
import { fieldToFix, useFocusProblem } from "@/components/auth/use-focus-problem";
import { Button, Field, fieldIds, Input } from "@/components/ui";
import { idle, keptValue, type ActionResult } from "@/lib/actions/result";

export function LinkSignInForm({ callbackUrl, defaultEmail }: { callbackUrl: string; defaultEmail?: string }) {
  const [state, action, pending] = useActionState<ActionResult, FormData>(requestSignInLink, idle);
  const form = useRef<HTMLFormElement>(null);
  const errors = state.ok ? undefined : state.fieldErrors;
  const ids = fieldIds("link-email");
  const fix = fieldToFix(state, ["email"], "email");
  useFocusProblem(form, state, fix);
  return (
    <form ref={form} action={action} className="space-y-4 rounded-lg border border-line bg-card p-5" noValidate>
      <h2 className="font-display text-xl">E-mail me a sign-in link</h2>
      <input type="hidden" name="callbackUrl" value={callbackUrl} />
      <Field label="E-mail address" htmlFor="link-email" error={errors?.email}>
        <Input
          id="link-email"
          name="email"
          type="email"
          autoComplete="email"
          defaultValue={keptValue(state, "email", defaultEmail)}
          autoFocus={fix === "email"}
          required
          invalid={Boolean(errors?.email)}
          aria-describedby={errors?.email ? ids.errorId : undefined}
        />
      </Field>
      <FormMessage state={state} />
      <Button type="submit" size="lg" pending={pending} className="w-full">
        Send the link
      </Button>
    </form>
  );
}

export function PasswordSignInForm({ callbackUrl }: { callbackUrl: string }) {
  const [state, action, pending] = useActionState<ActionResult, FormData>(signInWithPassword, idle);
  const form = useRef<HTMLFormElement>(null);
  const errors = state.ok ? undefined : state.fieldErrors;
  // A wrong password (no field named) most likely needs the password typed again.
  const fix = fieldToFix(state, ["email", "password"], !state.ok && state.status === 429 ? undefined : "password");
  useFocusProblem(form, state, fix);
  return (
    <form ref={form} action={action} className="space-y-4 rounded-lg border border-line bg-card p-5" noValidate>
      <h2 className="font-display text-xl">Studio staff: sign in with your password</h2>
      <input type="hidden" name="callbackUrl" value={callbackUrl} />
      <Field label="E-mail address" htmlFor="password-email" error={errors?.email}>
        <Input
          id="password-email"
          name="email"
          type="email"
          autoComplete="username"
          defaultValue={keptValue(state, "email")}
          autoFocus={fix === "email"}
          required
          invalid={Boolean(errors?.email)}
          aria-describedby={errors?.email ? fieldIds("password-email").errorId : undefined}
        />
      </Field>
      <Field label="Password" htmlFor="password" error={errors?.password}>
        <Input
          id="password"
          name="password"
          type="password"
          autoComplete="current-password"
          autoFocus={fix === "password"}
          required
          invalid={Boolean(errors?.password)}
          aria-describedby={errors?.password ? fieldIds("password").errorId : undefined}
        />
      </Field>
      <FormMessage state={state} />
      <Button type="submit" size="lg" variant="secondary" pending={pending} className="w-full">
        Sign in
      </Button>
    </form>
  );
}
