import type { ReactNode } from "react";

export type EmptyStateProps = {
  title: ReactNode;
  /** What to do next, in plain words. */
  children: ReactNode;
  action?: ReactNode;
  /** Heading level of the title, to fit the page outline. */
  level?: 2 | 3;
};

/** Shown where a list has nothing yet: three empty sample chips, a title and the next step. */
export function EmptyState({ title, children, action, level = 2 }: EmptyStateProps) {
  const Heading = level === 2 ? "h2" : "h3";
  return (
    <div className="flex flex-col items-center gap-3 rounded-lg border border-dashed border-line-strong bg-card px-6 py-10 text-center">
      <svg viewBox="0 0 72 40" width="72" height="40" aria-hidden="true" focusable="false" className="text-stone-400">
        <rect x="2" y="8" width="26" height="26" rx="2" fill="none" stroke="currentColor" strokeWidth="1.5" strokeDasharray="3 3" />
        <rect x="23" y="4" width="26" height="26" rx="2" fill="var(--color-card)" stroke="currentColor" strokeWidth="1.5" strokeDasharray="3 3" />
        <rect x="44" y="10" width="26" height="26" rx="2" fill="var(--color-card)" stroke="currentColor" strokeWidth="1.5" strokeDasharray="3 3" />
      </svg>
      <Heading className="font-display text-xl font-semibold text-ink">{title}</Heading>
      <div className="max-w-prose text-ink-soft">{children}</div>
      {action && <div className="mt-2 flex flex-wrap justify-center gap-2">{action}</div>}
    </div>
  );
}
