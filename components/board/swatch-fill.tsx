/* eslint-disable @next/next/no-img-element -- thumbnails come from an authenticated app route */
import { cx } from "@/components/ui";
import type { BoardFinish } from "@/lib/boards/types";

type Props = { finish: Pick<BoardFinish, "name" | "tint" | "imageUrl">; daylight: boolean; label: string; emphasised?: boolean };

/**
 * The colour of a swatch on a board, edge to edge, with its label in a neutral tab. A photo is
 * used only in daylight: under a lamp the flat colour is painted as an eye adapted to the lamp
 * sees it (paintUnderLight), and a photo could not be.
 */
export function SwatchFill({ finish, daylight, label, emphasised = false }: Props) {
  return (
    <span className="absolute inset-0 block overflow-hidden" data-swatch-colour="" style={{ backgroundColor: finish.tint }}>
      {daylight && finish.imageUrl && (
        <img src={finish.imageUrl} alt="" loading="lazy" decoding="async" className="absolute inset-0 size-full object-cover" />
      )}
      <span
        className={cx(
          "absolute bottom-0 left-0 max-w-full truncate px-1.5 py-0.5 text-xs font-medium leading-tight",
          emphasised ? "bg-ink text-white" : "bg-white/90 text-ink",
        )}
      >
        {label}
      </span>
    </span>
  );
}
