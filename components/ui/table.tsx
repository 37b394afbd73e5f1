import type { HTMLAttributes, ReactNode, TdHTMLAttributes, ThHTMLAttributes } from "react";
import { useId } from "react";
import { cx } from "./cx";

// The table family lives in one file: the parts only make sense together.

export type TableProps = {
  /** Names the table for screen readers and labels its scroll region. */
  caption: ReactNode;
  /** Keep the caption for screen readers only (when a heading above already says it). */
  captionHidden?: boolean;
  className?: string;
  children: ReactNode;
};

/**
 * Wide tables scroll sideways inside their own box on phones instead of squashing columns.
 * The box is focusable so keyboard users can scroll it too.
 */
export function Table({ caption, captionHidden = false, className, children }: TableProps) {
  const captionId = useId();
  return (
    <div
      role="region"
      aria-labelledby={captionId}
      tabIndex={0}
      className={cx("overflow-x-auto rounded-lg border border-line bg-card", className)}
    >
      <table className="w-full border-collapse text-left text-sm">
        <caption
          id={captionId}
          className={captionHidden ? "sr-only" : "px-4 pb-2 pt-3 text-left text-base font-semibold text-ink"}
        >
          {caption}
        </caption>
        {children}
      </table>
    </div>
  );
}

export function THead({ className, ...rest }: HTMLAttributes<HTMLTableSectionElement>) {
  // The header's lower rule is the strongest line in the table: it separates labels from data.
  return <thead {...rest} className={cx("bg-stone-50 [&_th]:border-b [&_th]:border-line-strong", className)} />;
}

export function TBody(props: HTMLAttributes<HTMLTableSectionElement>) {
  return <tbody {...props} />;
}

/** Totals row(s): bold, on the same light band as the header. */
export function TFoot({ className, ...rest }: HTMLAttributes<HTMLTableSectionElement>) {
  return <tfoot {...rest} className={cx("border-t border-line-strong bg-stone-50 font-semibold", className)} />;
}

export function Tr({ className, ...rest }: HTMLAttributes<HTMLTableRowElement>) {
  return <tr {...rest} className={cx("border-t border-line first:border-t-0", className)} />;
}

type NumericProp = {
  /** Right-aligned, tabular figures, no wrapping: for prices, ΔE00, LRV, quantities. */
  numeric?: boolean;
};

export function Th({ numeric = false, scope = "col", className, ...rest }: ThHTMLAttributes<HTMLTableCellElement> & NumericProp) {
  return (
    <th
      {...rest}
      scope={scope}
      className={cx(
        "px-4 py-2.5 align-bottom font-semibold text-ink-soft",
        numeric ? "text-right" : "text-left",
        className,
      )}
    />
  );
}

export function Td({ numeric = false, className, ...rest }: TdHTMLAttributes<HTMLTableCellElement> & NumericProp) {
  return (
    <td
      {...rest}
      className={cx("px-4 py-3 align-top text-ink", numeric && "figures whitespace-nowrap text-right", className)}
    />
  );
}
