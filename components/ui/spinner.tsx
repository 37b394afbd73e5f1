import { cx } from "./cx";

type SpinnerProps = {
  /** Read out by screen readers. Ignored when `decorative`. */
  label?: string;
  /** Set when the surrounding control already says it is busy (e.g. a pending Button). */
  decorative?: boolean;
  className?: string;
};

// A quarter arc on a faint ring. Under reduced motion it stands still; the ring alone still
// says "not done yet", and the label carries the meaning for screen readers.
export function Spinner({ label = "Working", decorative = false, className }: SpinnerProps) {
  const svg = (
    <svg
      viewBox="0 0 20 20"
      width="20"
      height="20"
      aria-hidden="true"
      focusable="false"
      className={cx("size-[1.1em] shrink-0 animate-spin", className)}
    >
      <circle cx="10" cy="10" r="7.5" fill="none" stroke="currentColor" strokeOpacity="0.25" strokeWidth="2.5" />
      <path d="M10 2.5a7.5 7.5 0 0 1 7.5 7.5" fill="none" stroke="currentColor" strokeWidth="2.5" strokeLinecap="round" />
    </svg>
  );
  if (decorative) return svg;
  return (
    <span role="status" className="inline-flex items-center">
      {svg}
      <span className="sr-only">{label}</span>
    </span>
  );
}
