import { CANVAS, type Rect } from "@/lib/boards/canvas";
import type { BoardItemView } from "@/lib/boards/types";

const pct = (value: number, of: number) => `${(value / of) * 100}%`;

/** Canvas units as percentages of the canvas, so a board scales to any width without measuring. */
export function percentBox(rect: Rect) {
  return {
    left: pct(rect.x, CANVAS.width),
    top: pct(rect.y, CANVAS.height),
    width: pct(rect.width, CANVAS.width),
    height: pct(rect.height, CANVAS.height),
  };
}

/** What a screen reader hears for a swatch on the canvas. */
export function describeItem(item: Pick<BoardItemView, "label" | "x" | "y" | "width" | "height" | "finish">) {
  return `${item.label}: ${item.finish.name}. At ${item.x}, ${item.y}; ${item.width} by ${item.height}.`;
}
