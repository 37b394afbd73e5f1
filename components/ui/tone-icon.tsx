import { cx } from "./cx";

export type Tone = "neutral" | "ok" | "caution" | "problem" | "info";

type ToneIconProps = { tone: Tone; className?: string };

// Each state has its own silhouette (ring, disc, triangle, diamond, square chip) so it reads
// without colour: in greyscale print, for colour-blind users, and in forced-colours mode.
// Decorative: the words next to it always say the state.
export function ToneIcon({ tone, className }: ToneIconProps) {
  return (
    <svg
      viewBox="0 0 16 16"
      width="16"
      height="16"
      aria-hidden="true"
      focusable="false"
      className={cx("shrink-0", className)}
    >
      {tone === "neutral" && <circle cx="8" cy="8" r="4.5" fill="none" stroke="currentColor" strokeWidth="2" />}
      {tone === "ok" && (
        <>
          <circle cx="8" cy="8" r="7" fill="currentColor" />
          <path d="M4.8 8.3l2.1 2.1 4.3-4.6" fill="none" stroke="#fff" strokeWidth="1.8" strokeLinecap="round" strokeLinejoin="round" />
        </>
      )}
      {tone === "caution" && (
        <>
          <path d="M8 1.5l7 12.5H1z" fill="currentColor" strokeLinejoin="round" />
          <path d="M8 6v3.6" stroke="#fff" strokeWidth="1.8" strokeLinecap="round" />
          <circle cx="8" cy="11.9" r="1" fill="#fff" />
        </>
      )}
      {tone === "problem" && (
        <>
          <path d="M8 .8L15.2 8 8 15.2.8 8z" fill="currentColor" />
          <path d="M5.9 5.9l4.2 4.2M10.1 5.9l-4.2 4.2" stroke="#fff" strokeWidth="1.8" strokeLinecap="round" />
        </>
      )}
      {tone === "info" && (
        <>
          <rect x="1.5" y="1.5" width="13" height="13" rx="2" fill="currentColor" />
          <path d="M8 7.2v4.3" stroke="#fff" strokeWidth="1.8" strokeLinecap="round" />
          <circle cx="8" cy="4.8" r="1" fill="#fff" />
        </>
      )}
    </svg>
  );
}
