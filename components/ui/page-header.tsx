import type { ReactNode } from "react";

export type PageHeaderProps = {
  title: ReactNode;
  /** A short line above the title, e.g. the project or client name. */
  eyebrow?: ReactNode;
  description?: ReactNode;
  actions?: ReactNode;
};

/** The page's one <h1>, in the display face, with its main actions. */
export function PageHeader({ title, eyebrow, description, actions }: PageHeaderProps) {
  return (
    <div className="flex flex-col gap-4 border-b border-line pb-6 sm:flex-row sm:items-end sm:justify-between">
      <div className="flex min-w-0 flex-col gap-1.5">
        {eyebrow && <p className="text-sm font-medium uppercase tracking-[0.08em] text-stone-600">{eyebrow}</p>}
        <h1 className="font-display text-3xl font-semibold tracking-[-0.01em] text-ink sm:text-4xl">{title}</h1>
        {description && <p className="max-w-prose text-base text-ink-soft">{description}</p>}
      </div>
      {actions && <div className="no-print flex shrink-0 flex-wrap gap-2">{actions}</div>}
    </div>
  );
}
