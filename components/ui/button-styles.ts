import { cx } from "./cx";

export type ButtonVariant = "primary" | "secondary" | "quiet" | "danger";
export type ButtonSize = "md" | "lg";

const base =
  "inline-flex items-center justify-center gap-2 rounded-md text-center font-medium leading-tight " +
  "transition-colors duration-150 ease-quiet select-none " +
  "disabled:cursor-not-allowed disabled:opacity-55 aria-busy:cursor-progress aria-busy:opacity-85";

// Hover only deepens what is already there: nothing depends on hover (phones have none).
const variants: Record<ButtonVariant, string> = {
  primary: "bg-spruce text-white hover:bg-spruce-deep active:bg-spruce-deep",
  secondary: "border border-line-strong bg-card text-ink hover:bg-stone-50 active:bg-stone-100",
  quiet: "text-spruce underline-offset-4 hover:bg-stone-100 hover:underline active:bg-stone-200",
  danger: "bg-problem text-white hover:bg-problem-ink active:bg-problem-ink",
};

// Both sizes are at least 44 px tall: clients and suppliers mostly tap on phones.
const sizes: Record<ButtonSize, string> = {
  md: "min-h-tap px-4 text-base",
  lg: "min-h-tap-lg px-6 text-lg",
};

/** Shared by Button, LinkButton and SubmitButton so a link and a button look the same. */
export function buttonClasses(variant: ButtonVariant = "primary", size: ButtonSize = "md", extra?: string): string {
  return cx(base, variants[variant], sizes[size], extra);
}
