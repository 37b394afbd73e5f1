"use client";

import { useActionState, useEffect } from "react";
import { inviteToProjectAction, type InviteState } from "@/app/studio/projects/[projectId]/actions";
import { FormMessage } from "@/components/auth/form-message";
import { TextField } from "@/components/auth/text-field";
import { Button, describeField, Field, Select } from "@/components/ui";
import { firstInvalid, keptValue } from "@/lib/actions/result";
import { tradeLabel } from "@/lib/suppliers/trades";
import { whoValue } from "@/lib/validation/project-invite";

type SupplierOption = { id: string; name: string; trade: string };

const initial: InviteState = { ok: false, error: "" };
/** The fields in the order they appear: focus goes to the first one to fix. */
const FIELDS = [
  { name: "who", id: "invite-who" },
  { name: "name", id: "invite-name" },
  { name: "email", id: "invite-email" },
] as const;

/**
 * The project is a hidden field (not a bound argument), so the form posts and answers with
 * JavaScript off too. After a refused send the form is drawn afresh (keyed on the attempt) from
 * what was sent, so every choice and every typed letter stays as it was.
 */
export function InviteToProjectForm({ projectId, suppliers }: { projectId: string; suppliers: SupplierOption[] }) {
  const [state, action, pending] = useActionState(inviteToProjectAction, initial);
  const errors = state.ok ? undefined : state.fieldErrors;
  const fix = FIELDS.find((f) => f.name === firstInvalid(state, FIELDS.map((field) => field.name)))?.id;
  const whoHint = suppliers.length ? undefined : "To invite a supplier's contact, add the supplier on the Suppliers page first.";
  useEffect(() => {
    if (fix) document.getElementById(fix)?.focus();
  }, [fix, state.attempt]);
  return (
    <form key={state.attempt ?? 0} action={action} className="space-y-4" noValidate>
      <h3 className="font-display text-lg">Invite someone</h3>
      <input type="hidden" name="projectId" value={projectId} />
      <Field label="They are" htmlFor="invite-who" error={errors?.who} hint={whoHint}>
        <Select
          {...describeField("invite-who", { hint: whoHint, error: errors?.who })}
          name="who"
          defaultValue={keptValue(state, "who", "client")}
          autoFocus={fix === "invite-who"}
        >
          <option value="client">A client (homeowner)</option>
          {suppliers.length ? (
            <optgroup label="A supplier's contact at">
              {suppliers.map((s) => (
                <option key={s.id} value={whoValue("supplier", s.id)}>
                  Contact at {s.name} ({tradeLabel(s.trade)})
                </option>
              ))}
            </optgroup>
          ) : null}
        </Select>
      </Field>
      <TextField id="invite-name" name="name" label="Name" autoComplete="off" errors={errors} defaultValue={keptValue(state, "name")} autoFocus={fix === "invite-name"} />
      <TextField
        id="invite-email"
        name="email"
        label="E-mail address"
        type="email"
        autoComplete="off"
        errors={errors}
        defaultValue={keptValue(state, "email")}
        autoFocus={fix === "invite-email"}
      />
      <FormMessage state={state} success="Invitation sent. They'll get an e-mail with a link to sign in." />
      <Button type="submit" pending={pending}>
        Send invitation
      </Button>
    </form>
  );
}
