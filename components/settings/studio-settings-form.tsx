"use client";

import { useActionState } from "react";
import { saveStudioSettingsAction, type SettingsSaved } from "@/app/studio/settings/actions";
import { FormMessage } from "@/components/auth/form-message";
import { TextField } from "@/components/auth/text-field";
import { Button, useRefusedFocus } from "@/components/ui";
import { idle, keptValue, type ActionResult } from "@/lib/actions/result";
import { studioSettingsFormFields } from "@/lib/validation/studio-settings";

type Props = { markup: string; tax: string };

const start: ActionResult<SettingsSaved> = idle;

function savedWords(data: SettingsSaved) {
  if (data.repricedOptions === 0) return "Saved. No open option's price needed working out again.";
  const options = data.repricedOptions === 1 ? "1 option" : `${data.repricedOptions} options`;
  const decisions = data.repricedDecisions === 1 ? "1 open decision" : `${data.repricedDecisions} open decisions`;
  return `Saved. ${options} on ${decisions} now carry the new price; approved decisions are unchanged.`;
}

/** The owner's form for the studio's markup and tax, typed as percentages. Works without JavaScript. */
export function StudioSettingsForm({ markup, tax }: Props) {
  const [state, action, pending] = useActionState(saveStudioSettingsAction, start);
  const { formRef, autoFocus } = useRefusedFocus(state, studioSettingsFormFields);
  const errors = state.ok ? undefined : state.fieldErrors;
  const field = (name: (typeof studioSettingsFormFields)[number], fallback: string) => ({
    name,
    errors,
    defaultValue: keptValue(state, name, fallback),
    autoFocus: autoFocus(name),
    inputMode: "decimal" as const,
    autoComplete: "off",
  });
  return (
    <form ref={formRef} action={action} className="max-w-md space-y-4" noValidate>
      <TextField {...field("markup", markup)} label="Markup on cost (%)" hint="Added to the cost of an option's finishes, before tax. 0 for none." />
      <TextField {...field("tax", tax)} label="Tax on the client's price (%)" hint="GST is 10 %. Every price a client sees includes it." />
      <FormMessage state={state} success={state.ok ? savedWords(state.data) : undefined} />
      <Button type="submit" pending={pending}>
        Save settings
      </Button>
    </form>
  );
}
