import type { SelectHTMLAttributes } from "react";
import { controlClasses } from "./control-styles";

export type SelectProps = SelectHTMLAttributes<HTMLSelectElement> & {
  /** Marks the value as wrong: sets aria-invalid and the error border. */
  invalid?: boolean;
};

// A native <select> (best on phones and with assistive tech) with our own chevron.
export function Select({ invalid = false, className, children, ...rest }: SelectProps) {
  return (
    <span className="relative block">
      <select
        {...rest}
        aria-invalid={invalid || rest["aria-invalid"] || undefined}
        className={controlClasses(`appearance-none pr-10 ${className ?? ""}`)}
      >
        {children}
      </select>
      <svg
        viewBox="0 0 16 16"
        width="16"
        height="16"
        aria-hidden="true"
        focusable="false"
        className="pointer-events-none absolute right-3 top-1/2 -translate-y-1/2 text-ink-soft"
      >
        <path d="M4 6l4 4 4-4" fill="none" stroke="currentColor" strokeWidth="1.8" strokeLinecap="round" strokeLinejoin="round" />
      </svg>
    </span>
  );
}
