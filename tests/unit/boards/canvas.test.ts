import { describe, expect, it } from "vitest";
import { applyArrowKey, CANVAS, findFreeSpot, fitToCanvas, isOnCanvas, resizeTo, snapPosition, snapToGrid } from "@/lib/boards/canvas";

// The canvas is 1200 × 800 with a 20-unit grid: the house's own choice, recorded in db/schema/boards.ts.
const rect = { x: 100, y: 100, width: 200, height: 160 };

describe("grid snapping", () => {
  it("rounds to the nearest grid line", () => {
    expect([snapToGrid(9), snapToGrid(10), snapToGrid(29), snapToGrid(-9)]).toEqual([0, 20, 20, -0]);
  });

  it("lands a dropped swatch on the grid and wholly on the canvas", () => {
    expect(snapPosition(rect, 113, 87)).toEqual({ ...rect, x: 120, y: 80 });
    expect(snapPosition(rect, 1150, 790)).toEqual({ ...rect, x: CANVAS.width - 200, y: CANVAS.height - 160 });
    expect(snapPosition(rect, -50, -50)).toEqual({ ...rect, x: 0, y: 0 });
  });

  it("keeps every fitted rectangle on the canvas, however wild the input", () => {
    for (const r of [
      { x: -500, y: 5000, width: 5000, height: 10 },
      { x: 1199, y: 799, width: 41, height: 41 },
      { x: 0, y: 0, width: 0, height: 0 },
    ]) {
      expect(isOnCanvas(fitToCanvas(r))).toBe(true);
    }
  });
});

describe("arrow keys", () => {
  it("move by one grid step, Shift by five", () => {
    expect(applyArrowKey(rect, "ArrowRight", { shift: false, alt: false })).toMatchObject({ x: 120, y: 100 });
    expect(applyArrowKey(rect, "ArrowUp", { shift: true, alt: false })).toMatchObject({ x: 100, y: 0 });
  });

  it("stop at the edge instead of leaving the canvas", () => {
    expect(applyArrowKey({ ...rect, x: 0 }, "ArrowLeft", { shift: true, alt: false }).x).toBe(0);
  });

  it("resize from the bottom-right corner with Alt, never below the smallest size", () => {
    expect(applyArrowKey(rect, "ArrowRight", { shift: false, alt: true })).toEqual({ ...rect, width: 220 });
    expect(applyArrowKey(rect, "ArrowUp", { shift: true, alt: true })).toEqual({ ...rect, height: 60 });
    expect(resizeTo(rect, 0, 0)).toEqual({ ...rect, width: 40, height: 40 });
    expect(resizeTo(rect, 5000, 5000)).toEqual({ ...rect, width: 1100, height: 700 });
  });
});

describe("finding room for a new swatch", () => {
  it("takes the first free spot, left to right then down", () => {
    expect(findFreeSpot([], 160, 160)).toEqual({ x: 0, y: 0, width: 160, height: 160 });
    expect(findFreeSpot([{ x: 0, y: 0, width: 200, height: 200 }], 160, 160)).toEqual({ x: 200, y: 0, width: 160, height: 160 });
  });

  it("falls back to the corner when the canvas is full", () => {
    expect(findFreeSpot([{ x: 0, y: 0, width: 1200, height: 800 }], 160, 160)).toEqual({ x: 0, y: 0, width: 160, height: 160 });
  });
});
