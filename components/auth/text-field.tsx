import type { InputHTMLAttributes } from "react";
import { Field, fieldIds, Input } from "@/components/ui";
import type { FieldErrors } from "@/lib/http";

type Props = InputHTMLAttributes<HTMLInputElement> & {
  name: string;
  label: string;
  hint?: string;
  errors?: FieldErrors;
};

/** A labelled input wired to an action's field errors by name. */
export function TextField({ name, label, hint, errors, id, ...rest }: Props) {
  const inputId = id ?? `field-${name}`;
  const error = errors?.[name];
  const ids = fieldIds(inputId);
  const describedBy = [hint ? ids.hintId : null, error ? ids.errorId : null].filter(Boolean).join(" ") || undefined;
  return (
    <Field label={label} htmlFor={inputId} hint={hint} error={error}>
      <Input id={inputId} name={name} invalid={Boolean(error)} aria-describedby={describedBy} {...rest} />
    </Field>
  );
}
