import type { ButtonHTMLAttributes } from "react";
import type { ButtonSize, ButtonVariant } from "./button-styles";
import { buttonClasses } from "./button-styles";
import { Spinner } from "./spinner";

export type ButtonProps = ButtonHTMLAttributes<HTMLButtonElement> & {
  variant?: ButtonVariant;
  size?: ButtonSize;
  /** Shows a spinner, sets aria-busy and disables the button until the work finishes. */
  pending?: boolean;
};

// `type` is left to the caller, as on a native <button> (inside a form it submits).
export function Button({
  variant = "primary",
  size = "md",
  pending = false,
  disabled,
  className,
  children,
  ...rest
}: ButtonProps) {
  return (
    <button
      {...rest}
      disabled={disabled || pending}
      aria-busy={pending || undefined}
      className={buttonClasses(variant, size, className)}
    >
      {pending && <Spinner decorative />}
      {children}
    </button>
  );
}
