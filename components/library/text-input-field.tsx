import type { InputHTMLAttributes, ReactNode } from "react";
import { describeField, Field, Input } from "@/components/ui";

type Props = Omit<InputHTMLAttributes<HTMLInputElement>, "onChange" | "value"> & {
  id: string;
  label: string;
  hint?: ReactNode;
  error?: string[];
  optional?: boolean;
  value: string;
  onValue: (value: string) => void;
};

/** A labelled text input wired to its hint and error, for the finish form's controlled fields. */
export function TextInputField({ id, label, hint, error, optional, value, onValue, className, ...rest }: Props) {
  return (
    <Field htmlFor={id} label={label} hint={hint} error={error} optional={optional} className={className}>
      <Input {...rest} {...describeField(id, { hint, error })} value={value} onChange={(e) => onValue(e.target.value)} />
    </Field>
  );
}
