"use client";

import { useActionState } from "react";
import { roomAction } from "@/app/studio/projects/[projectId]/room-actions";
import { FormMessage } from "@/components/auth/form-message";
import { Button, Input, useRefusedFocus, VisuallyHidden } from "@/components/ui";
import { idle, keptValue } from "@/lib/actions/result";

type Props = { projectId: string; room: { id: string; name: string }; index: number; count: number };

/**
 * One room: rename, move up or down, remove. One form, and the button pressed says which (its
 * name and value are posted with the form, with or without JavaScript). Enter in the name saves it.
 */
export function RoomRow({ projectId, room, index, count }: Props) {
  const [state, action, pending] = useActionState(roomAction, idle);
  const { formRef, autoFocus } = useRefusedFocus(state, ["name"]);
  const nameError = state.ok ? undefined : state.fieldErrors?.name?.[0];
  const inputId = `room-name-${room.id}`;
  return (
    <li className="py-3">
      <form ref={formRef} action={action} className="flex flex-col gap-2" noValidate>
        <input type="hidden" name="projectId" value={projectId} />
        <input type="hidden" name="roomId" value={room.id} />
        <input type="hidden" name="index" value={index} />
        <label htmlFor={inputId} className="text-sm font-medium text-ink-soft">
          Room {index + 1}
        </label>
        <div className="flex flex-wrap items-center gap-2">
          <Input
            id={inputId}
            name="name"
            defaultValue={keptValue(state, "name", room.name)}
            invalid={Boolean(nameError)}
            aria-describedby={nameError ? `${inputId}-error` : undefined}
            autoFocus={autoFocus("name")}
            className="min-w-0 flex-1 basis-40"
            maxLength={60}
          />
          <Button type="submit" name="intent" value="rename" variant="secondary" pending={pending}>
            Save name<VisuallyHidden> of {room.name}</VisuallyHidden>
          </Button>
        </div>
        {nameError ? (
          <p id={`${inputId}-error`} className="text-sm font-medium text-problem-ink">
            {nameError}
          </p>
        ) : null}
        <div className="flex flex-wrap gap-2">
          <Button type="submit" name="intent" value="up" variant="quiet" disabled={index === 0 || pending}>
            Move up<VisuallyHidden> {room.name}</VisuallyHidden>
          </Button>
          <Button type="submit" name="intent" value="down" variant="quiet" disabled={index === count - 1 || pending}>
            Move down<VisuallyHidden> {room.name}</VisuallyHidden>
          </Button>
          <Button type="submit" name="intent" value="remove" variant="quiet" disabled={pending}>
            Remove<VisuallyHidden> {room.name}</VisuallyHidden>
          </Button>
        </div>
        {nameError ? null : <FormMessage state={state} />}
      </form>
    </li>
  );
}
