"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button, Field, Input, Notice, Select } from "@/components/ui";
import { formatDay } from "@/lib/format";
import { isDueAfterOrderBy, suggestOrderBy } from "@/lib/decisions/order-by";
import type { DecisionView, PickerFinish } from "@/lib/decisions/types";
import type { FieldErrors } from "@/lib/http";
import type { StudioRates } from "@/lib/pricing/option-price";
import { emptyOption, draftToBody, type DecisionDraft } from "./decision-draft";
import { decisionApi, decisionKey, DecisionRequestError, patchJson, postJson } from "./decision-fetch";
import { OptionFields } from "./option-fields";

type Props = {
  projectId: string;
  installDate: string | null;
  rooms: { id: string; name: string }[];
  boards: { id: string; name: string }[];
  finishes: PickerFinish[];
  /** The studio's markup and tax (studio settings), to show each price worked out as it is typed. */
  rates: StudioRates;
  initial: DecisionDraft;
  /** Present when editing: the decision and the version the designer started from. */
  editing?: { decisionId: string; version: number };
};

/** The designer's form for a new decision or an open one: room, title, allowance, due date, 2–4 options. */
export function DecisionForm({ projectId, installDate, rooms, boards, finishes, rates, initial, editing }: Props) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [draft, setDraft] = useState(initial);
  const [localErrors, setLocalErrors] = useState<FieldErrors>({});
  const save = useMutation({
    mutationFn: (body: Record<string, unknown>) =>
      editing
        ? patchJson<DecisionView>(decisionApi(editing.decisionId), { ...body, version: editing.version })
        : postJson<DecisionView>(`/api/projects/${encodeURIComponent(projectId)}/decisions`, body),
    onSuccess: (view) => {
      queryClient.setQueryData(decisionKey(view.id), view);
      router.push(`/studio/projects/${projectId}/decisions/${view.id}`);
    },
  });
  const serverErrors = save.error instanceof DecisionRequestError ? save.error.fieldErrors : undefined;
  const errors = { ...serverErrors, ...localErrors };
  const chosen = draft.options.flatMap((o) => o.lines.map((l) => finishes.find((f) => f.id === l.finishId))).filter((f) => f !== undefined);
  const orderBy = suggestOrderBy(installDate, chosen);

  return (
    <form
      noValidate
      className="space-y-6"
      onSubmit={(e) => {
        e.preventDefault();
        const { body, errors: money } = draftToBody(draft);
        setLocalErrors(money);
        if (Object.keys(money).length === 0) save.mutate(body);
      }}
    >
      <div className="grid gap-4 rounded-lg border border-line bg-card p-4 sm:grid-cols-2 sm:p-5">
        <Field label="What is being decided" htmlFor="decision-title" hint="For example: Benchtop, Island end panel, Pendants" error={errors.title}>
          <Input id="decision-title" value={draft.title} onChange={(e) => setDraft({ ...draft, title: e.target.value })} invalid={Boolean(errors.title)} />
        </Field>
        <Field label="Room" htmlFor="decision-room" error={errors.room}>
          <Select id="decision-room" value={draft.room} onChange={(e) => setDraft({ ...draft, room: e.target.value })} invalid={Boolean(errors.room)}>
            {rooms.map((r) => (
              <option key={r.id} value={r.id}>
                {r.name}
              </option>
            ))}
          </Select>
        </Field>
        <Field label="Allowance in the contract ($)" htmlFor="decision-allowance" hint="The prime-cost amount the client pays, including tax; prices are shown against it." error={errors.allowanceCents}>
          <Input id="decision-allowance" inputMode="decimal" value={draft.allowance} onChange={(e) => setDraft({ ...draft, allowance: e.target.value })} invalid={Boolean(errors.allowanceCents)} />
        </Field>
        <Field label="Client to decide by" htmlFor="decision-due" error={errors.dueDate}>
          <Input id="decision-due" type="date" value={draft.dueDate} onChange={(e) => setDraft({ ...draft, dueDate: e.target.value })} invalid={Boolean(errors.dueDate)} />
        </Field>
        <div className="sm:col-span-2">
          {orderBy ? (
            <p className={isDueAfterOrderBy(draft.dueDate, orderBy) ? "font-medium text-caution-ink" : "text-ink-soft"}>
              Suggested order-by date: <span className="figures">{formatDay(orderBy.date)}</span> — install {formatDay(installDate)} less the longest lead time
              ({orderBy.leadTimeDays} days, {orderBy.finishName}).
              {isDueAfterOrderBy(draft.dueDate, orderBy) && " The due date is later than that: the slowest option could not arrive in time."}
            </p>
          ) : (
            <p className="text-ink-soft">{installDate ? "Add finishes to see the order-by date." : "Set the project's install date to get an order-by date."}</p>
          )}
        </div>
      </div>

      {errors.options && <p className="font-medium text-problem-ink">{errors.options.join(" ")}</p>}
      {draft.options.map((option, i) => (
        <OptionFields
          key={option.key}
          option={option}
          index={i}
          finishes={finishes}
          rates={rates}
          boards={boards}
          errors={errors}
          canRemove={draft.options.length > 2}
          onChange={(next) => setDraft({ ...draft, options: draft.options.map((o, k) => (k === i ? next : o)) })}
          onRemove={() => setDraft({ ...draft, options: draft.options.filter((_, k) => k !== i) })}
        />
      ))}
      {draft.options.length < 4 && (
        <Button type="button" variant="secondary" onClick={() => setDraft({ ...draft, options: [...draft.options, emptyOption()] })}>
          Add an option
        </Button>
      )}

      {!editing && (
        <label className="flex min-h-tap items-center gap-3">
          <input type="checkbox" className="size-5 accent-spruce" checked={draft.notify} onChange={(e) => setDraft({ ...draft, notify: e.target.checked })} />
          E-mail the clients that this decision is waiting for them
        </label>
      )}
      {save.error && (
        <Notice tone="problem" title={save.error.message}>
          {serverErrors ? "The fields that need attention are marked above." : "Nothing was saved."}
        </Notice>
      )}
      <Button type="submit" size="lg" pending={save.isPending || save.isSuccess}>
        {editing ? "Save changes" : "Open the decision"}
      </Button>
    </form>
  );
}
