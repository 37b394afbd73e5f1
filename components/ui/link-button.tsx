import Link from "next/link";
import type { ComponentProps } from "react";
import type { ButtonSize, ButtonVariant } from "./button-styles";
import { buttonClasses } from "./button-styles";

export type LinkButtonProps = ComponentProps<typeof Link> & {
  variant?: ButtonVariant;
  size?: ButtonSize;
};

/** A navigation link that looks like a Button. Use it when the action goes somewhere. */
export function LinkButton({ variant = "primary", size = "md", className, children, ...rest }: LinkButtonProps) {
  return (
    <Link {...rest} className={buttonClasses(variant, size, className)}>
      {children}
    </Link>
  );
}
