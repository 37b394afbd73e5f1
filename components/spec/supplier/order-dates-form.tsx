"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useId, useState, type FormEvent } from "react";
import { Button, describeField, Field, Input } from "@/components/ui";
import { patchOrderDates, revisionKey, type ApiError } from "./api";

type Props = { revisionId: string; lineId: string; item: string; orderedOn: string | null; expectedOn: string | null };

/** The two dates a supplier keeps for a line: when they ordered it and when it should arrive. */
export function OrderDatesForm({ revisionId, lineId, item, orderedOn, expectedOn }: Props) {
  const id = useId();
  const queryClient = useQueryClient();
  const [ordered, setOrdered] = useState(orderedOn ?? "");
  const [expected, setExpected] = useState(expectedOn ?? "");
  const mutation = useMutation<unknown, ApiError>({
    mutationFn: () => patchOrderDates(revisionId, lineId, { orderedOn: ordered || null, expectedOn: expected || null }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: revisionKey(revisionId) }),
  });
  const errors = mutation.error?.fieldErrors;
  const submit = (event: FormEvent) => {
    event.preventDefault();
    mutation.mutate();
  };
  const orderedId = `${id}-ordered`;
  const expectedId = `${id}-expected`;
  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-3" aria-label={`Order dates for ${item}`}>
      <div className="grid gap-3 sm:grid-cols-2">
        <Field htmlFor={orderedId} label="Ordered on" error={errors?.orderedOn}>
          <Input type="date" value={ordered} onChange={(e) => setOrdered(e.target.value)} {...describeField(orderedId, { error: errors?.orderedOn })} />
        </Field>
        <Field htmlFor={expectedId} label="Expected delivery" optional error={errors?.expectedOn}>
          <Input type="date" value={expected} min={ordered || undefined} onChange={(e) => setExpected(e.target.value)} {...describeField(expectedId, { error: errors?.expectedOn })} />
        </Field>
      </div>
      {mutation.error && !errors && (
        <p role="alert" className="rounded-md bg-problem-wash px-3 py-2 text-problem-ink">
          {mutation.error.message}
        </p>
      )}
      {mutation.isSuccess && !mutation.isPending && (
        <p role="status" className="text-ok-ink">
          Saved.
        </p>
      )}
      <Button type="submit" variant="secondary" pending={mutation.isPending} className="w-full sm:w-auto">
        Save dates
      </Button>
    </form>
  );
}
