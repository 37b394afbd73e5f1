"use client";

import { useActionState, useState } from "react";
import { inviteToProjectAction } from "@/app/studio/projects/[projectId]/actions";
import { FormMessage } from "@/components/auth/form-message";
import { TextField } from "@/components/auth/text-field";
import { Button, Field, Select } from "@/components/ui";
import { idle } from "@/lib/actions/result";

type SupplierOption = { id: string; name: string; trade: string };

export function InviteToProjectForm({ projectId, suppliers }: { projectId: string; suppliers: SupplierOption[] }) {
  const [state, action, pending] = useActionState(inviteToProjectAction.bind(null, projectId), idle);
  const [role, setRole] = useState<"client" | "supplier">("client");
  const errors = state.ok ? undefined : state.fieldErrors;
  return (
    <form action={action} className="space-y-4" noValidate>
      <h3 className="font-display text-lg">Invite someone</h3>
      <Field label="They are" htmlFor="invite-role" error={errors?.role}>
        <Select id="invite-role" name="role" value={role} onChange={(e) => setRole(e.target.value === "supplier" ? "supplier" : "client")}>
          <option value="client">A client (homeowner)</option>
          <option value="supplier">A supplier&apos;s contact</option>
        </Select>
      </Field>
      {role === "supplier" ? (
        <Field label="Supplier" htmlFor="invite-supplier" error={errors?.supplierId}>
          <Select id="invite-supplier" name="supplierId" invalid={Boolean(errors?.supplierId)} defaultValue="">
            <option value="" disabled>
              Choose a supplier
            </option>
            {suppliers.map((s) => (
              <option key={s.id} value={s.id}>
                {s.name} ({s.trade})
              </option>
            ))}
          </Select>
        </Field>
      ) : null}
      <TextField name="name" label="Name" autoComplete="off" errors={errors} />
      <TextField name="email" label="E-mail address" type="email" autoComplete="off" errors={errors} />
      <FormMessage state={state} success="Invitation sent. They'll get an e-mail with a link to sign in." />
      <Button type="submit" pending={pending}>
        Send invitation
      </Button>
    </form>
  );
}
