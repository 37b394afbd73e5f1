import type { ReactNode } from "react";
import { useId } from "react";
import { cx } from "./cx";

export type SectionProps = {
  title: ReactNode;
  description?: ReactNode;
  actions?: ReactNode;
  /** h2 under the page title, h3 inside a Card or another Section. */
  level?: 2 | 3;
  id?: string;
  className?: string;
  children: ReactNode;
};

/** A titled part of a page: a <section> named by its heading, so it is a landmark. */
export function Section({ title, description, actions, level = 2, id, className, children }: SectionProps) {
  const headingId = useId();
  const Heading = level === 2 ? "h2" : "h3";
  return (
    <section id={id} aria-labelledby={headingId} className={cx("flex flex-col gap-4", className)}>
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div className="flex min-w-0 flex-col gap-1">
          <Heading
            id={headingId}
            className={level === 2 ? "font-display text-2xl font-semibold text-ink" : "text-lg font-semibold text-ink"}
          >
            {title}
          </Heading>
          {description && <p className="max-w-prose text-ink-soft">{description}</p>}
        </div>
        {actions && <div className="flex flex-wrap gap-2">{actions}</div>}
      </div>
      {children}
    </section>
  );
}
