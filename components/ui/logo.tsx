import { cx } from "./cx";

export type LogoProps = {
  size?: "md" | "lg";
  className?: string;
};

// The mark: three sample chips laid over one another, as on a board: two neutral greys and
// the spruce accent. Paper-coloured edges keep the overlaps legible at small sizes.
export function Logo({ size = "md", className }: LogoProps) {
  const px = size === "lg" ? 36 : 26;
  return (
    <span
      role="img"
      aria-label="Mottle"
      className={cx("inline-flex items-center gap-2 text-ink", size === "lg" ? "gap-2.5" : "gap-2", className)}
    >
      <svg viewBox="0 0 32 32" width={px} height={px} aria-hidden="true" focusable="false" className="shrink-0">
        <rect x="1.5" y="3.5" width="15" height="15" rx="1.5" fill="var(--color-stone-300)" />
        <rect x="8.5" y="9.5" width="15" height="15" rx="1.5" fill="var(--color-stone-500)" stroke="var(--color-paper)" strokeWidth="1.5" />
        <rect x="15.5" y="14.5" width="15" height="15" rx="1.5" fill="var(--color-spruce)" stroke="var(--color-paper)" strokeWidth="1.5" />
      </svg>
      <span
        aria-hidden="true"
        className={cx(
          "font-display font-semibold leading-none tracking-[-0.015em]",
          size === "lg" ? "text-3xl" : "text-2xl",
        )}
      >
        Mottle
      </span>
    </span>
  );
}
