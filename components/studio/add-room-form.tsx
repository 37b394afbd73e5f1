"use client";

import { useActionState } from "react";
import { addRoomAction } from "@/app/studio/projects/[projectId]/room-actions";
import { FormMessage } from "@/components/auth/form-message";
import { TextField } from "@/components/auth/text-field";
import { Button, useRefusedFocus } from "@/components/ui";
import { idle, keptValue } from "@/lib/actions/result";

/** "Add room": the new room goes to the end of the list. */
export function AddRoomForm({ projectId }: { projectId: string }) {
  const [state, action, pending] = useActionState(addRoomAction, idle);
  const { formRef, autoFocus } = useRefusedFocus(state, ["name"]);
  const errors = state.ok ? undefined : state.fieldErrors;
  return (
    <form ref={formRef} action={action} className="flex flex-col gap-3" noValidate>
      <input type="hidden" name="projectId" value={projectId} />
      <TextField
        id="new-room-name"
        name="name"
        label="New room"
        placeholder="Powder room"
        errors={errors}
        defaultValue={state.ok ? "" : keptValue(state, "name")}
        autoFocus={autoFocus("name")}
        maxLength={60}
      />
      <FormMessage state={state} success="Room added." />
      <Button type="submit" variant="secondary" pending={pending} className="self-start">
        Add room
      </Button>
    </form>
  );
}
