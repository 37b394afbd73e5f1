"use client";

/* eslint-disable @next/next/no-img-element -- the photo comes from an authenticated route; next/image would fetch it without the session */
import { useRef, useState, type PointerEvent } from "react";

export type Box = { left: number; top: number; width: number; height: number };

type Props = {
  src: string;
  alt: string;
  /** Size of the stored photo, so a box drawn on the shown image maps to its pixels. */
  photoWidth: number;
  photoHeight: number;
  box: Box | null;
  onBox: (box: Box | null) => void;
};

const clamp = (v: number, min: number, max: number) => Math.min(max, Math.max(min, v));

/**
 * The photo, on which the designer drags a box over a white or grey card. The box is kept in the
 * stored photo's pixels whatever size the photo is shown at.
 */
export function NeutralBox({ src, alt, photoWidth, photoHeight, box, onBox }: Props) {
  const frame = useRef<HTMLDivElement>(null);
  const [start, setStart] = useState<{ x: number; y: number } | null>(null);

  const toPhoto = (event: PointerEvent) => {
    const rect = frame.current?.getBoundingClientRect();
    if (!rect || rect.width === 0) return { x: 0, y: 0 };
    return {
      x: Math.round(clamp((event.clientX - rect.left) / rect.width, 0, 1) * photoWidth),
      y: Math.round(clamp((event.clientY - rect.top) / rect.height, 0, 1) * photoHeight),
    };
  };
  const spanning = (a: { x: number; y: number }, b: { x: number; y: number }): Box => ({
    left: Math.min(a.x, b.x),
    top: Math.min(a.y, b.y),
    width: Math.max(1, Math.abs(a.x - b.x)),
    height: Math.max(1, Math.abs(a.y - b.y)),
  });

  return (
    <div
      ref={frame}
      className="relative cursor-crosshair touch-none select-none overflow-hidden rounded-chip bg-surround"
      onPointerDown={(e) => {
        e.currentTarget.setPointerCapture(e.pointerId);
        const p = toPhoto(e);
        setStart(p);
        onBox(null);
      }}
      onPointerMove={(e) => start && onBox(spanning(start, toPhoto(e)))}
      onPointerUp={(e) => {
        if (start) {
          const b = spanning(start, toPhoto(e));
          onBox(b.width < 4 || b.height < 4 ? null : b);
        }
        setStart(null);
      }}
    >
      <img src={src} alt={alt} draggable={false} className="block w-full" style={{ aspectRatio: `${photoWidth} / ${photoHeight}` }} />
      {box && (
        <div
          aria-hidden="true"
          className="pointer-events-none absolute border-2 border-white outline-2 outline-black/70"
          style={{
            left: `${(box.left / photoWidth) * 100}%`,
            top: `${(box.top / photoHeight) * 100}%`,
            width: `${(box.width / photoWidth) * 100}%`,
            height: `${(box.height / photoHeight) * 100}%`,
          }}
        />
      )}
    </div>
  );
}
