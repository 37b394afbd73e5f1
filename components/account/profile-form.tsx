"use client";

import { useActionState } from "react";
import { saveProfileAction } from "@/app/account/actions";
import { FormMessage } from "@/components/auth/form-message";
import { TextField } from "@/components/auth/text-field";
import { Button, useRefusedFocus } from "@/components/ui";
import { idle, keptValue } from "@/lib/actions/result";

const fields = ["name", "phone"] as const;

/** The person's own name and phone number. */
export function ProfileForm({ name, phone, staff }: { name: string; phone: string; staff: boolean }) {
  const [state, action, pending] = useActionState(saveProfileAction, idle);
  const { formRef, autoFocus } = useRefusedFocus(state, fields);
  const errors = state.ok ? undefined : state.fieldErrors;
  const field = (key: (typeof fields)[number], fallback: string) => ({ name: key, id: `profile-${key}`, errors, defaultValue: keptValue(state, key, fallback), autoFocus: autoFocus(key) });
  return (
    <form ref={formRef} action={action} className="space-y-4" noValidate>
      <TextField
        {...field("name", name)}
        label="Your name"
        autoComplete="name"
        hint={staff ? undefined : "Studios you work with show you by the name they typed for you."}
      />
      <TextField {...field("phone", phone)} label="Phone (optional)" type="tel" autoComplete="tel" hint={staff ? "Suppliers see this as the studio's contact number." : undefined} />
      <FormMessage state={state} success="Your details are saved." />
      <Button type="submit" pending={pending}>
        Save details
      </Button>
    </form>
  );
}
