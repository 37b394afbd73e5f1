"use client";

import { useActionState } from "react";
import { saveStudioSettingsAction, type SettingsSaved } from "@/app/studio/settings/actions";
import { FormMessage } from "@/components/auth/form-message";
import { Button, useRefusedFocus } from "@/components/ui";
import { idle, keptValue, type ActionResult } from "@/lib/actions/result";
import { ACCESS_STANDARD_WORDS } from "@/lib/boards/words";
import { ACCESS_STANDARDS, type AccessStandard } from "@/lib/colour";
import { accessStandardFormFields } from "@/lib/validation/studio-settings";

const start: ActionResult<SettingsSaved> = idle;

/** The owner's choice of the one access standard the low-vision checks follow. Works without JavaScript. */
export function AccessStandardForm({ current }: { current: AccessStandard }) {
  const [state, action, pending] = useActionState(saveStudioSettingsAction, start);
  const { formRef, autoFocus } = useRefusedFocus(state, accessStandardFormFields);
  const chosen = keptValue(state, "accessStandard", current);
  const error = state.ok ? undefined : state.fieldErrors?.accessStandard?.[0];
  return (
    <form ref={formRef} action={action} className="max-w-xl space-y-4" noValidate>
      <input type="hidden" name="section" value="access" />
      <fieldset className="flex flex-col gap-2" aria-describedby={error ? "access-standard-error" : undefined}>
        <legend className="mb-1 text-base font-medium text-ink">Access checks follow</legend>
        {ACCESS_STANDARDS.map((value, i) => {
          const words = ACCESS_STANDARD_WORDS[value];
          return (
            <label key={value} className="flex min-h-tap cursor-pointer items-start gap-3 rounded-md border border-line bg-card p-3 has-[:checked]:border-ink has-[:checked]:bg-stone-50">
              <input
                type="radio"
                name="accessStandard"
                value={value}
                defaultChecked={chosen === value}
                autoFocus={i === 0 && autoFocus("accessStandard")}
                aria-invalid={error ? true : undefined}
                className="mt-1 size-5 shrink-0 accent-[var(--color-ink)]"
              />
              <span className="flex flex-col">
                <span className="font-medium text-ink">{words.label}</span>
                <span className="text-ink">{words.rule}</span>
                <span className="text-sm text-stone-600">{words.hint}</span>
              </span>
            </label>
          );
        })}
      </fieldset>
      {error && (
        <p id="access-standard-error" className="text-sm font-medium text-problem-ink">
          {error}
        </p>
      )}
      <FormMessage state={state} success={state.ok ? "Saved. Every board and decision now checks access by this standard." : undefined} />
      <Button type="submit" pending={pending}>
        Save access standard
      </Button>
    </form>
  );
}
