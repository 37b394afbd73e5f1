import type { InputHTMLAttributes } from "react";
import { controlClasses } from "./control-styles";

export type InputProps = InputHTMLAttributes<HTMLInputElement> & {
  /** Marks the value as wrong: sets aria-invalid and the error border. */
  invalid?: boolean;
};

export function Input({ invalid = false, className, ...rest }: InputProps) {
  return (
    <input
      {...rest}
      aria-invalid={invalid || rest["aria-invalid"] || undefined}
      className={controlClasses(className)}
    />
  );
}
