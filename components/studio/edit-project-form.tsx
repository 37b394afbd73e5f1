"use client";

import { useActionState } from "react";
import { editProjectAction } from "@/app/studio/projects/[projectId]/actions";
import { FormMessage } from "@/components/auth/form-message";
import { TextField } from "@/components/auth/text-field";
import { Button, useRefusedFocus } from "@/components/ui";
import { idle, keptValue } from "@/lib/actions/result";

const fields = ["name", "siteAddress", "installDate"] as const;

type Props = { projectId: string; name: string; siteAddress: string | null; installDate: string | null };

/** Corrects the project's details; a refused submit keeps what was typed, with or without JavaScript. */
export function EditProjectForm({ projectId, name, siteAddress, installDate }: Props) {
  const [state, action, pending] = useActionState(editProjectAction, idle);
  const { formRef, autoFocus } = useRefusedFocus(state, fields);
  const errors = state.ok ? undefined : state.fieldErrors;
  const field = (key: (typeof fields)[number], fallback: string) => ({
    name: key,
    id: `edit-project-${key}`,
    errors,
    defaultValue: keptValue(state, key, fallback),
    autoFocus: autoFocus(key),
  });
  return (
    <form ref={formRef} action={action} className="space-y-4" noValidate>
      <input type="hidden" name="projectId" value={projectId} />
      <TextField {...field("name", name)} label="Project name" />
      <TextField {...field("siteAddress", siteAddress ?? "")} label="Site address (optional)" />
      <TextField
        {...field("installDate", installDate ?? "")}
        label="Install date (optional)"
        type="date"
        hint="Order-by dates count back from this. Revisions already issued keep the dates they were issued with."
      />
      <FormMessage state={state} success="Project saved." />
      <Button type="submit" pending={pending}>
        Save project
      </Button>
    </form>
  );
}
