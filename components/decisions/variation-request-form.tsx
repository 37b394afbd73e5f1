"use client";

import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useId, useState } from "react";
import { Button, Field, Money, Textarea } from "@/components/ui";
import type { DecisionView } from "@/lib/decisions/types";
import { taxWords } from "@/lib/pricing/option-price";
import { decisionApi, DecisionRequestError, postJson } from "./decision-fetch";

type Props = { view: DecisionView; audience: "client" | "staff" };

/** Asking for a change after approval: a reason, and optionally another of the options. */
export function VariationRequestForm({ view, audience }: Props) {
  const router = useRouter();
  const groupId = useId();
  const [reason, setReason] = useState("");
  const [optionId, setOptionId] = useState("");
  const others = view.options.filter((o) => o.id !== view.lockedOptionId && !o.addedByVariation);
  const ask = useMutation({
    mutationFn: () => postJson<{ variation: { id: string } }>(`${decisionApi(view.id)}/variations`, { reason, optionId: optionId || null }),
    onSuccess: ({ variation }) =>
      router.push(
        audience === "client"
          ? `/client/decisions/${view.id}/variations/${variation.id}`
          : `/studio/projects/${view.projectId}/decisions/${view.id}/variations/${variation.id}`,
      ),
  });
  const fieldErrors = ask.error instanceof DecisionRequestError ? ask.error.fieldErrors : undefined;
  return (
    <form
      className="space-y-5"
      noValidate
      onSubmit={(e) => {
        e.preventDefault();
        ask.mutate();
      }}
    >
      <Field label="What would you like to change, and why?" htmlFor="variation-reason" error={fieldErrors?.reason}>
        <Textarea id="variation-reason" rows={4} value={reason} maxLength={2000} onChange={(e) => setReason(e.target.value)} invalid={Boolean(fieldErrors?.reason)} />
      </Field>
      {others.length > 0 && (
        <fieldset className="space-y-2" aria-describedby={`${groupId}-hint`}>
          <legend className="font-medium">Instead of the approved option (optional)</legend>
          <p id={`${groupId}-hint`} className="text-sm text-stone-600">
            Prices shown are the original quotes; the variation&apos;s price difference comes from {audience === "client" ? "your designer" : "you"}.
          </p>
          {[{ id: "", label: "Something else: described above", priceCents: null, priceDetail: null }, ...others].map((o) => (
            <label key={o.id || "none"} className="flex min-h-tap cursor-pointer items-center gap-3 rounded-md border border-line bg-card px-3 py-2">
              <input type="radio" name="variation-option" value={o.id} checked={optionId === o.id} onChange={() => setOptionId(o.id)} className="size-5 accent-spruce" />
              <span>
                {o.label}
                {o.priceCents !== null && (
                  <span className="text-ink-soft">
                    {" "}
                    · <Money cents={o.priceCents} /> {taxWords(view.taxBasisPoints)}
                    {o.priceDetail?.overridden && " · Price set by hand"}
                  </span>
                )}
              </span>
            </label>
          ))}
          {fieldErrors?.optionId && <p className="text-sm font-medium text-problem-ink">{fieldErrors.optionId.join(" ")}</p>}
        </fieldset>
      )}
      {ask.error && !fieldErrors && (
        <p role="alert" className="rounded-md bg-problem-wash px-3 py-2 text-problem-ink">
          {ask.error.message}
        </p>
      )}
      <Button type="submit" size="lg" pending={ask.isPending || ask.isSuccess}>
        {audience === "client" ? "Ask for this change" : "Record the request"}
      </Button>
    </form>
  );
}
