import type { BoardItemView } from "@/lib/boards/types";
import { cx } from "@/components/ui";
import { describeItem, percentBox } from "./canvas-geometry";
import { SwatchFill } from "./swatch-fill";

type Props = { items: BoardItemView[]; daylight: boolean; highlightIds?: readonly string[]; title: string };

/** A board to look at, not edit: for clients and for print. Scales with its width. */
export function BoardPicture({ items, daylight, highlightIds = [], title }: Props) {
  return (
    <div role="img" aria-label={title} className="relative aspect-[3/2] w-full overflow-hidden rounded-sm bg-surround print:border print:border-black" data-board-picture="">
      {items.map((item) => {
        const highlighted = highlightIds.includes(item.id);
        return (
          <div
            key={item.id}
            title={describeItem(item)}
            style={{ ...percentBox(item), position: "absolute" }}
            className={cx("print:outline print:outline-1 print:outline-stone-400", highlighted && "z-10 shadow-[0_0_0_2px_#fff,0_0_0_4px_var(--color-ink)]")}
          >
            <SwatchFill finish={item.finish} daylight={daylight} label={item.label} emphasised={highlighted} />
          </div>
        );
      })}
    </div>
  );
}
