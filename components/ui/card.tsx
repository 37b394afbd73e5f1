import type { ReactNode } from "react";
import { useId } from "react";
import { cx } from "./cx";

export type CardProps = {
  title?: ReactNode;
  /** Heading level for the title; pick the one that fits the page outline. */
  level?: 2 | 3;
  /** Buttons or links shown beside the title (they wrap under it on phones). */
  actions?: ReactNode;
  className?: string;
  children: ReactNode;
};

/** A white panel on the paper background. With a title it becomes a labelled region. */
export function Card({ title, level = 2, actions, className, children }: CardProps) {
  const headingId = useId();
  const Heading = level === 2 ? "h2" : "h3";
  return (
    <section
      aria-labelledby={title ? headingId : undefined}
      className={cx("rounded-lg border border-line bg-card shadow-card", className)}
    >
      {(title || actions) && (
        <div className="flex flex-wrap items-center justify-between gap-3 border-b border-line px-4 py-3 sm:px-5">
          {title && (
            <Heading id={headingId} className="text-lg font-semibold text-ink">
              {title}
            </Heading>
          )}
          {actions && <div className="flex flex-wrap gap-2">{actions}</div>}
        </div>
      )}
      <div className="p-4 sm:p-5">{children}</div>
    </section>
  );
}
