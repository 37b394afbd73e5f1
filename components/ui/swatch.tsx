/* eslint-disable @next/next/no-img-element -- photos come from authenticated app routes; next/image would proxy them without the session */
import type { LrvSource } from "./swatch-format";
import { lrvText, normaliseHex, swatchLabel } from "./swatch-format";
import { cx } from "./cx";

export type SwatchSize = "sm" | "md" | "lg";

export type SwatchProps = {
  /** The measured flat colour, "#rrggbb". Anything unreadable is shown as "no colour recorded". */
  hex: string;
  /** A photo of the real finish; shown large, with the flat colour in a notch of the mount. */
  imageUrl?: string | null;
  name: string;
  productCode?: string | null;
  lrv?: number | null;
  lrvSource?: LrvSource | null;
  size?: SwatchSize;
  selected?: boolean;
  /** Name, code and LRV under the sample. Default true. */
  caption?: boolean;
  /** The neutral mount: mid-grey (default, for judging colour) or pale. Both have zero chroma. */
  surround?: "grey" | "light";
  className?: string;
};

// Colour area 64 / 128 / 224 px with a 6 / 10 / 14 px mount; the figure is exactly
// area + 2 × mount wide so captions line up in a grid. In photo mode the flat chip sits in a
// notch whose frame is as thick as the mount, so it reads as cut into the mount, not pasted on.
const sizes: Record<SwatchSize, { figure: string; pad: string; chip: string; notch: string; text: string }> = {
  sm: { figure: "w-[76px]", pad: "p-1.5", chip: "size-6 border-[6px]", notch: "-bottom-1.5 -right-1.5", text: "text-xs" },
  md: { figure: "w-[148px]", pad: "p-2.5", chip: "size-11 border-[10px]", notch: "-bottom-2.5 -right-2.5", text: "text-sm" },
  lg: { figure: "w-[252px]", pad: "p-3.5", chip: "size-18 border-[14px]", notch: "-bottom-3.5 -right-3.5", text: "text-sm" },
};

/**
 * A finish shown well. Rules that matter here:
 * - The colour sits on a zero-chroma mount; no accent colour ever touches it.
 * - "Selected" is a dark neutral ring OUTSIDE the mount, plus the word "Selected".
 * - Figures are tabular so LRVs in a row of swatches read cleanly.
 */
export function Swatch({
  hex,
  imageUrl,
  name,
  productCode,
  lrv,
  lrvSource,
  size = "md",
  selected = false,
  caption = true,
  surround = "grey",
  className,
}: SwatchProps) {
  const colour = normaliseHex(hex);
  const s = sizes[size];
  const label = swatchLabel(name, lrv, colour !== null);
  const lrvLine = lrvText(lrv, lrvSource);

  const chip = (extra: string) => (
    <div
      role="img"
      aria-label={label}
      data-swatch-colour=""
      className={cx(extra, colour === null && "bg-no-colour")}
      style={colour ? { backgroundColor: colour } : undefined}
    />
  );

  return (
    <figure className={cx("flex shrink-0 flex-col gap-2", s.figure, className)}>
      <div
        data-swatch-surround=""
        data-selected={selected || undefined}
        className={cx(
          "rounded-chip",
          s.pad,
          surround === "grey" ? "bg-surround" : "bg-surround-light ring-1 ring-line",
          selected && "outline-2 outline-offset-2 outline-ink",
        )}
      >
        {imageUrl ? (
          <div className="relative">
            <img
              src={imageUrl}
              alt={`Photo of the ${name} finish`}
              loading="lazy"
              decoding="async"
              data-swatch-colour=""
              className="block aspect-square w-full object-cover"
            />
            {chip(
              cx(
                "absolute box-content",
                s.chip,
                s.notch,
                surround === "grey" ? "border-surround" : "border-surround-light",
              ),
            )}
          </div>
        ) : (
          chip("aspect-square w-full")
        )}
      </div>
      {caption ? (
        <figcaption className={cx("flex flex-col gap-0.5 leading-snug", s.text)}>
          <span className="font-medium text-ink">{name}</span>
          {productCode && <span className="figures text-stone-600">{productCode}</span>}
          {lrvLine && <span className="figures text-stone-600">{lrvLine}</span>}
          {selected && (
            <span className="inline-flex items-center gap-1 font-semibold text-ink">
              <svg viewBox="0 0 16 16" width="14" height="14" aria-hidden="true" focusable="false">
                <path d="M3.5 8.5l3 3 6-7" fill="none" stroke="currentColor" strokeWidth="2" strokeLinecap="round" strokeLinejoin="round" />
              </svg>
              Selected
            </span>
          )}
        </figcaption>
      ) : (
        selected && <span className="sr-only">Selected</span>
      )}
    </figure>
  );
}
