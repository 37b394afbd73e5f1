"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useEffect, useRef, useState } from "react";
import { Button, Card, Notice } from "@/components/ui";
import type { FieldErrors } from "@/lib/http";
import { CautionPicker } from "./caution-picker";
import { ColourSection } from "./colour-section";
import { draftFromFinish, toRequestBody, type FinishDraft } from "./finish-draft";
import { CareField, IdentityFields, PriceFields } from "./finish-fields";
import type { SupplierOption } from "./finish-filters";
import { ApiError, libraryKeys, saveFinish } from "./library-api";
import { PhotoSection } from "./photo-section";

type Props = { finishId: string | null; initial: FinishDraft; suppliers: SupplierOption[] };

/**
 * Create or edit a finish. Everything is checked on the server (the same zod schema as the API);
 * its field errors come back beside each field and nothing is saved until they are fixed.
 */
export function FinishForm({ finishId, initial, suppliers }: Props) {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [draft, setDraft] = useState(initial);
  const [saved, setSaved] = useState(initial);
  const [errors, setErrors] = useState<FieldErrors>({});
  const change = (next: Partial<FinishDraft>) => setDraft((d) => ({ ...d, ...next }));
  const form = useRef<HTMLFormElement>(null);
  // After a refused save, take keyboard and screen-reader users to the first field to fix.
  useEffect(() => {
    if (Object.keys(errors).length) form.current?.querySelector<HTMLElement>("[aria-invalid=true]")?.focus();
  }, [errors]);

  const mutation = useMutation({
    mutationFn: () => saveFinish(finishId, toRequestBody(draft, finishId ? saved : null)),
    onMutate: () => setErrors({}),
    onSuccess: async (finish) => {
      await queryClient.invalidateQueries({ queryKey: libraryKeys.all });
      if (!finishId) {
        router.push(`/studio/library/${finish.id}?added=1`);
        return;
      }
      const fresh = draftFromFinish(finish);
      setSaved(fresh);
      setDraft((d) => ({ ...fresh, measurement: d.measurement }));
      router.refresh();
    },
    onError: (error) => setErrors(error instanceof ApiError ? error.fieldErrors : {}),
  });

  const problem = mutation.error ? mutation.error.message : null;
  return (
    <form
      ref={form}
      noValidate
      className="flex flex-col gap-6"
      onSubmit={(e) => {
        e.preventDefault();
        mutation.mutate();
      }}
    >
      <Card title="What it is">
        <IdentityFields draft={draft} errors={errors} suppliers={suppliers} onChange={change} />
      </Card>
      <Card title="Colour">
        <div className="flex flex-col gap-6">
          <PhotoSection draft={draft} error={errors.imageId} onChange={change} />
          <ColourSection draft={draft} errors={errors} onChange={change} />
        </div>
      </Card>
      <Card title="Cost and lead time">
        <PriceFields draft={draft} errors={errors} onChange={change} />
      </Card>
      <Card title="Care and cautions">
        <div className="flex flex-col gap-6">
          <CareField draft={draft} errors={errors} onChange={change} />
          <CautionPicker selected={draft.cautions} error={errors.cautions ?? errors["cautions.0"]} onChange={(cautions) => change({ cautions })} />
        </div>
      </Card>
      <div className="flex flex-col gap-3" aria-live="polite">
        {problem && (
          <Notice tone="problem" title="Not saved yet">
            {problem}
          </Notice>
        )}
        {mutation.isSuccess && finishId && <p role="status" className="rounded-md bg-ok-wash px-3 py-2 text-ok-ink">Saved.</p>}
        <div>
          <Button type="submit" size="lg" pending={mutation.isPending}>
            {finishId ? "Save changes" : "Save finish"}
          </Button>
        </div>
      </div>
    </form>
  );
}
