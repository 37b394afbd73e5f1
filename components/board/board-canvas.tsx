"use client";

import { useId, useRef } from "react";
import type { Rect } from "@/lib/boards/canvas";
import type { BoardItemView } from "@/lib/boards/types";
import { MotionScope } from "@/components/motion-scope";
import { CanvasItem } from "./canvas-item";

type Props = {
  items: BoardItemView[];
  editable: boolean;
  daylight: boolean;
  selectedId: string | null;
  highlightIds: readonly string[];
  onSelect: (itemId: string | null) => void;
  onChange: (itemId: string, rect: Rect) => void;
};

// Faint guides every 100 units, in a grey a little lighter than the surround and just as neutral.
const guides =
  "linear-gradient(to right, oklch(0.62 0 0) 1px, transparent 1px), linear-gradient(to bottom, oklch(0.62 0 0) 1px, transparent 1px)";

/** The 1200 × 800 board on its mid-grey surround, scaled to the width it is given. */
export function BoardCanvas({ items, editable, daylight, selectedId, highlightIds, onSelect, onChange }: Props) {
  const ref = useRef<HTMLDivElement>(null);
  const hintId = useId();
  return (
    <div className="flex flex-col gap-2">
      <div
        ref={ref}
        role="group"
        aria-label="Board canvas"
        data-board-canvas=""
        className="relative aspect-[3/2] w-full touch-pan-y overflow-hidden rounded-sm bg-surround"
        style={editable ? { backgroundImage: guides, backgroundSize: `${100 / 12}% ${100 / 8}%` } : undefined}
        onPointerDown={(e) => {
          if (e.target === e.currentTarget) onSelect(null);
        }}
      >
        <MotionScope>
          {items.map((item) => (
            <CanvasItem
            key={item.id}
            item={item}
            editable={editable}
            daylight={daylight}
            selected={item.id === selectedId}
            highlighted={highlightIds.includes(item.id)}
            canvasRef={ref}
            hintId={hintId}
            onSelect={onSelect}
              onChange={onChange}
            />
          ))}
        </MotionScope>
      </div>
      {editable && (
        <p id={hintId} className="text-sm text-stone-600">
          Drag a swatch, or select it and use the arrow keys (Shift for bigger steps, Alt with the arrows to resize). Everything
          snaps to a 20-unit grid.
        </p>
      )}
    </div>
  );
}
