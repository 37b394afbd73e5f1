import type { TextareaHTMLAttributes } from "react";
import { controlClasses } from "./control-styles";

export type TextareaProps = TextareaHTMLAttributes<HTMLTextAreaElement> & {
  /** Marks the value as wrong: sets aria-invalid and the error border. */
  invalid?: boolean;
};

export function Textarea({ invalid = false, className, rows = 4, ...rest }: TextareaProps) {
  return (
    <textarea
      {...rest}
      rows={rows}
      aria-invalid={invalid || rest["aria-invalid"] || undefined}
      className={controlClasses(`py-2.5 leading-normal ${className ?? ""}`)}
    />
  );
}
