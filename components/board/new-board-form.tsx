"use client";

import { useActionState } from "react";
import { FormMessage } from "@/components/auth/form-message";
import { TextField } from "@/components/auth/text-field";
import { Button, Field, Select } from "@/components/ui";
import { idle, type ActionResult } from "@/lib/actions/result";

type Props = {
  rooms: { id: string; name: string }[];
  action: (prev: ActionResult, form: FormData) => Promise<ActionResult>;
};

export function NewBoardForm({ rooms, action }: Props) {
  const [state, formAction, pending] = useActionState(action, idle);
  const errors = state.ok ? undefined : state.fieldErrors;
  return (
    <form action={formAction} className="flex flex-col gap-4" noValidate>
      <Field label="Room" htmlFor="board-room" error={errors?.roomId}>
        <Select id="board-room" name="roomId" invalid={Boolean(errors?.roomId)} defaultValue={rooms[0]?.id}>
          {rooms.map((room) => (
            <option key={room.id} value={room.id}>
              {room.name}
            </option>
          ))}
        </Select>
      </Field>
      <TextField name="name" id="board-name" label="Board name" placeholder="Kitchen: pale timber scheme" errors={errors} />
      <FormMessage state={state} />
      <Button type="submit" pending={pending} className="self-start">
        Start the board
      </Button>
    </form>
  );
}
