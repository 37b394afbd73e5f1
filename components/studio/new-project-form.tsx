"use client";

import { useActionState } from "react";
import { createProjectAction } from "@/app/studio/projects/new/actions";
import { FormMessage } from "@/components/auth/form-message";
import { TextField } from "@/components/auth/text-field";
import { Button, useRefusedFocus } from "@/components/ui";
import { idle, keptValue } from "@/lib/actions/result";

const fields = ["name", "siteAddress", "installDate", "rooms"] as const;

/** A refused submit comes back with what was typed (kept by the action), with or without JavaScript. */
export function NewProjectForm() {
  const [state, action, pending] = useActionState(createProjectAction, idle);
  const { formRef, autoFocus } = useRefusedFocus(state, fields);
  const errors = state.ok ? undefined : state.fieldErrors;
  const field = (name: (typeof fields)[number], fallback = "") => ({ name, errors, defaultValue: keptValue(state, name, fallback), autoFocus: autoFocus(name) });
  return (
    <form ref={formRef} action={action} className="space-y-4 rounded-lg border border-line bg-card p-5" noValidate>
      <TextField {...field("name")} label="Project name" placeholder="Hillcrest Road terrace" />
      <TextField {...field("siteAddress")} label="Site address (optional)" />
      <TextField {...field("installDate")} label="Target install date (optional)" type="date" hint="Order-by dates count back from this." />
      <TextField {...field("rooms", "Kitchen")} label="Rooms" hint="Separate with commas: Kitchen, Laundry, Ensuite" />
      <FormMessage state={state} />
      <Button type="submit" pending={pending}>
        Create project
      </Button>
    </form>
  );
}
