"use client";

import { useActionState } from "react";
import { createBoardAction } from "@/app/studio/projects/[projectId]/boards/actions";
import { FormMessage } from "@/components/auth/form-message";
import { TextField } from "@/components/auth/text-field";
import { Button, Field, Select, useRefusedFocus } from "@/components/ui";
import { idle, keptValue } from "@/lib/actions/result";

type Props = { projectId: string; rooms: { id: string; name: string }[] };

const fields = ["roomId", "name"] as const;

/** Posts the project's id in a hidden input; a refused submit comes back with what was chosen and typed. */
export function NewBoardForm({ projectId, rooms }: Props) {
  const [state, action, pending] = useActionState(createBoardAction, idle);
  const { formRef, autoFocus } = useRefusedFocus(state, fields);
  const errors = state.ok ? undefined : state.fieldErrors;
  return (
    <form ref={formRef} action={action} className="flex flex-col gap-4" noValidate>
      <input type="hidden" name="projectId" value={projectId} />
      <Field label="Room" htmlFor="board-room" error={errors?.roomId}>
        <Select id="board-room" name="roomId" invalid={Boolean(errors?.roomId)} defaultValue={keptValue(state, "roomId", rooms[0]?.id)} autoFocus={autoFocus("roomId")}>
          {rooms.map((room) => (
            <option key={room.id} value={room.id}>
              {room.name}
            </option>
          ))}
        </Select>
      </Field>
      <TextField name="name" id="board-name" label="Board name" placeholder="Kitchen: pale timber scheme" errors={errors} defaultValue={keptValue(state, "name")} autoFocus={autoFocus("name")} />
      <FormMessage state={state} />
      <Button type="submit" pending={pending} className="self-start">
        Start the board
      </Button>
    </form>
  );
}
