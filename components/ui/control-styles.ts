import { cx } from "./cx";

// Shared by Input, Textarea and Select. 16 px text so phones do not zoom on focus; the
// border meets 3:1 against paper; an invalid control gets a thicker problem-coloured edge
// (not colour alone: Field also prints the error in words).
export function controlClasses(extra?: string): string {
  return cx(
    "block w-full min-h-tap rounded-md border border-line-strong bg-card px-3 text-base text-ink",
    "placeholder:text-stone-500 disabled:cursor-not-allowed disabled:bg-stone-100 disabled:text-stone-600",
    "aria-invalid:border-problem aria-invalid:shadow-[inset_0_0_0_1px_var(--color-problem)]",
    extra,
  );
}
