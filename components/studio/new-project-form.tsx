"use client";

import { useActionState } from "react";
import { createProjectAction } from "@/app/studio/projects/new/actions";
import { FormMessage } from "@/components/auth/form-message";
import { TextField } from "@/components/auth/text-field";
import { Button } from "@/components/ui";
import { idle } from "@/lib/actions/result";

export function NewProjectForm() {
  const [state, action, pending] = useActionState(createProjectAction, idle);
  const errors = state.ok ? undefined : state.fieldErrors;
  return (
    <form action={action} className="space-y-4 rounded-lg border border-line bg-card p-5" noValidate>
      <TextField name="name" label="Project name" placeholder="Hillcrest Road terrace" errors={errors} />
      <TextField name="siteAddress" label="Site address (optional)" errors={errors} />
      <TextField name="installDate" label="Target install date (optional)" type="date" hint="Order-by dates count back from this." errors={errors} />
      <TextField name="rooms" label="Rooms" hint="Separate with commas: Kitchen, Laundry, Ensuite" defaultValue="Kitchen" errors={errors} />
      <FormMessage state={state} />
      <Button type="submit" pending={pending}>
        Create project
      </Button>
    </form>
  );
}
