"use client";

import { animate, m, useDragControls, useMotionValue, useReducedMotion } from "framer-motion";
import type { KeyboardEvent, PointerEvent, RefObject } from "react";
import { useLayoutEffect, useRef, useState } from "react";
import { cx } from "@/components/ui";
import { applyArrowKey, CANVAS, isArrowKey, resizeTo, snapPosition, type Rect } from "@/lib/boards/canvas";
import type { BoardItemView } from "@/lib/boards/types";
import { describeItem, percentBox } from "./canvas-geometry";
import { SwatchFill } from "./swatch-fill";

type Props = {
  item: BoardItemView;
  editable: boolean;
  selected: boolean;
  highlighted: boolean;
  daylight: boolean;
  canvasRef: RefObject<HTMLDivElement | null>;
  hintId: string;
  onSelect: (itemId: string) => void;
  onChange: (itemId: string, rect: Rect) => void;
};

// The one motion on the board: a dropped swatch settling onto the grid, which shows the snap.
const settle = { type: "spring", stiffness: 520, damping: 42 } as const;

/** One swatch on the canvas: drag it, or focus it and use the arrow keys; the corner resizes. */
export function CanvasItem({ item, editable, selected, highlighted, daylight, canvasRef, hintId, onSelect, onChange }: Props) {
  const x = useMotionValue(0);
  const y = useMotionValue(0);
  const controls = useDragControls();
  const reduceMotion = useReducedMotion();
  const residual = useRef<{ dx: number; dy: number } | null>(null);
  const resizeStart = useRef<{ px: number; py: number } | null>(null);
  const [preview, setPreview] = useState<Rect | null>(null);
  const pending = item.id.startsWith("pending-");
  const movable = editable && !pending;
  const rect = preview ?? item;

  // After a drop the swatch's base moves to the snapped spot; carry the leftover offset over to
  // the new base before paint (so nothing jumps), then let it settle to zero.
  useLayoutEffect(() => {
    const r = residual.current;
    if (!r) return;
    residual.current = null;
    x.set(reduceMotion ? 0 : r.dx);
    y.set(reduceMotion ? 0 : r.dy);
    if (!reduceMotion) {
      void animate(x, 0, settle);
      void animate(y, 0, settle);
    }
  }, [item.x, item.y, x, y, reduceMotion]);

  const scale = () => (canvasRef.current?.getBoundingClientRect().width ?? CANVAS.width) / CANVAS.width;

  function finishDrag() {
    const s = scale();
    const next = snapPosition(item, item.x + x.get() / s, item.y + y.get() / s);
    if (next.x === item.x && next.y === item.y) {
      if (reduceMotion) [x, y].forEach((v) => v.set(0));
      else [x, y].forEach((v) => void animate(v, 0, settle));
      return;
    }
    residual.current = { dx: x.get() - (next.x - item.x) * s, dy: y.get() - (next.y - item.y) * s };
    onChange(item.id, next);
  }

  function handleKey(event: KeyboardEvent<HTMLDivElement>) {
    if (!movable || !isArrowKey(event.key)) return;
    event.preventDefault();
    const next = applyArrowKey(item, event.key, { shift: event.shiftKey, alt: event.altKey });
    if (next.x !== item.x || next.y !== item.y || next.width !== item.width || next.height !== item.height) onChange(item.id, next);
  }

  const resizeHandlers = {
    onPointerDown: (e: PointerEvent<HTMLSpanElement>) => {
      e.currentTarget.setPointerCapture(e.pointerId);
      resizeStart.current = { px: e.clientX, py: e.clientY };
      onSelect(item.id);
    },
    onPointerMove: (e: PointerEvent<HTMLSpanElement>) => {
      const start = resizeStart.current;
      if (!start) return;
      const s = scale();
      setPreview(resizeTo(item, item.width + (e.clientX - start.px) / s, item.height + (e.clientY - start.py) / s));
    },
    onPointerUp: () => {
      resizeStart.current = null;
      if (preview && (preview.width !== item.width || preview.height !== item.height)) onChange(item.id, preview);
      setPreview(null);
    },
  };

  return (
    <m.div
      role="button"
      tabIndex={0}
      aria-roledescription={movable ? "movable swatch" : "swatch"}
      aria-pressed={selected}
      aria-label={describeItem(item)}
      aria-describedby={movable ? hintId : undefined}
      data-item-id={item.id}
      data-highlighted={highlighted || undefined}
      drag={movable}
      dragControls={controls}
      dragListener={false}
      dragConstraints={canvasRef}
      dragElastic={0}
      dragMomentum={false}
      onDragEnd={finishDrag}
      whileDrag={{ zIndex: 40, cursor: "grabbing" }}
      onPointerDown={(e) => {
        onSelect(item.id);
        if (movable && !(e.target as Element).closest("[data-resize]")) controls.start(e);
      }}
      onKeyDown={handleKey}
      onFocus={() => onSelect(item.id)}
      style={{ ...percentBox(rect), x, y, position: "absolute", touchAction: movable ? "none" : undefined }}
      className={cx(
        "group select-none focus-visible:outline-[3px] focus-visible:outline-offset-2 focus-visible:outline-ink",
        movable ? "cursor-grab" : "cursor-pointer",
        selected && "outline-2 outline-offset-2 outline-ink",
        highlighted && "z-30 shadow-[0_0_0_3px_#fff,0_0_0_6px_var(--color-ink)]",
        pending && "opacity-80",
      )}
    >
      <SwatchFill finish={item.finish} daylight={daylight} label={item.label} emphasised={highlighted} />
      {movable && (
        <span
          data-resize=""
          aria-hidden="true"
          {...resizeHandlers}
          className="absolute -bottom-1.5 -right-1.5 z-10 size-4 cursor-nwse-resize touch-none rounded-[2px] border-2 border-ink bg-white opacity-0 group-focus-visible:opacity-100 group-hover:opacity-100 group-aria-pressed:opacity-100"
        />
      )}
    </m.div>
  );
}
