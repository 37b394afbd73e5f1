"use client";

import { useActionState } from "react";
import { requestSignInLink, signInWithPassword } from "@/app/(public)/sign-in/actions";
import { FormMessage } from "@/components/auth/form-message";
import { Button, Field, fieldIds, Input } from "@/components/ui";
import { idle } from "@/lib/actions/result";

export function LinkSignInForm({ callbackUrl, defaultEmail }: { callbackUrl: string; defaultEmail?: string }) {
  const [state, action, pending] = useActionState(requestSignInLink, idle);
  const errors = state.ok ? undefined : state.fieldErrors;
  const ids = fieldIds("link-email");
  return (
    <form action={action} className="space-y-4 rounded-lg border border-line bg-card p-5" noValidate>
      <h2 className="font-display text-xl">E-mail me a sign-in link</h2>
      <input type="hidden" name="callbackUrl" value={callbackUrl} />
      <Field label="E-mail address" htmlFor="link-email" error={errors?.email}>
        <Input
          id="link-email"
          name="email"
          type="email"
          autoComplete="email"
          defaultValue={defaultEmail}
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
  const [state, action, pending] = useActionState(signInWithPassword, idle);
  const errors = state.ok ? undefined : state.fieldErrors;
  return (
    <form action={action} className="space-y-4 rounded-lg border border-line bg-card p-5" noValidate>
      <h2 className="font-display text-xl">Studio staff: sign in with your password</h2>
      <input type="hidden" name="callbackUrl" value={callbackUrl} />
      <Field label="E-mail address" htmlFor="password-email" error={errors?.email}>
        <Input
          id="password-email"
          name="email"
          type="email"
          autoComplete="username"
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
