import localFont from "next/font/local";

// Self-hosted from fonts/ (copied from @fontsource-variable, SIL OFL 1.1, licences beside them):
// the app runs without internet, so Google-hosted fonts cannot be fetched at build time.
// Put `${sans.variable} ${display.variable}` on <html>; app/globals.css maps them into Tailwind.

/** Figtree: the interface face. It has true tabular figures, so every number uses it. */
export const sans = localFont({
  src: [
    { path: "../fonts/figtree-latin-wght-normal.woff2", weight: "300 900", style: "normal" },
    { path: "../fonts/figtree-latin-wght-italic.woff2", weight: "300 900", style: "italic" },
  ],
  variable: "--font-sans",
  display: "swap",
  fallback: ["ui-sans-serif", "system-ui", "sans-serif"],
});

/**
 * Fraunces: headings and the wordmark only. Its figures are proportional (no `tnum`),
 * so prices and measurements never use it.
 */
export const display = localFont({
  src: [{ path: "../fonts/fraunces-latin-wght-normal.woff2", weight: "100 900", style: "normal" }],
  variable: "--font-display",
  display: "swap",
  fallback: ["ui-serif", "Georgia", "serif"],
});
