/** The board canvas, in canvas units; screens scale it to fit. Matches the board_item columns. */
export const CANVAS = { width: 1200, height: 800 } as const;

/** Swatches snap to this grid; arrow keys move by one step, with Shift by BIG_STEP. */
export const GRID = 20;
export const BIG_STEP = 100;

/** Smallest swatch: anything under about 40 units is too small to judge a colour by. */
export const MIN_SIZE = 40;

export const DEFAULT_SIZE = { width: 160, height: 160 } as const;

export type Rect = { x: number; y: number; width: number; height: number };

export function snapToGrid(value: number, grid = GRID): number {
  return Math.round(value / grid) * grid;
}

function clamp(value: number, min: number, max: number): number {
  return Math.min(max, Math.max(min, value));
}

/** Keeps a rectangle whole and on the canvas: size first (at least MIN_SIZE), then position. */
export function fitToCanvas(rect: Rect): Rect {
  const width = clamp(rect.width, MIN_SIZE, CANVAS.width);
  const height = clamp(rect.height, MIN_SIZE, CANVAS.height);
  return {
    width,
    height,
    x: clamp(rect.x, 0, CANVAS.width - width),
    y: clamp(rect.y, 0, CANVAS.height - height),
  };
}

/** Where a swatch dropped at (x, y) lands: on the grid and wholly on the canvas. */
export function snapPosition(rect: Rect, x: number, y: number): Rect {
  return fitToCanvas({ ...rect, x: snapToGrid(x), y: snapToGrid(y) });
}

export function moveBy(rect: Rect, dx: number, dy: number): Rect {
  return snapPosition(rect, rect.x + dx, rect.y + dy);
}

/** Resizes from the bottom-right corner, keeping the top-left where it is. */
export function resizeTo(rect: Rect, width: number, height: number): Rect {
  const w = clamp(snapToGrid(width), MIN_SIZE, CANVAS.width - rect.x);
  const h = clamp(snapToGrid(height), MIN_SIZE, CANVAS.height - rect.y);
  return { ...rect, width: w, height: h };
}

export type ArrowKey = "ArrowLeft" | "ArrowRight" | "ArrowUp" | "ArrowDown";

const directions: Record<ArrowKey, [number, number]> = {
  ArrowLeft: [-1, 0],
  ArrowRight: [1, 0],
  ArrowUp: [0, -1],
  ArrowDown: [0, 1],
};

export function isArrowKey(key: string): key is ArrowKey {
  return Object.hasOwn(directions, key);
}

/**
 * The keyboard's way to do what a drag does: arrows move, Shift makes the step bigger, Alt
 * resizes from the bottom-right corner instead of moving.
 */
export function applyArrowKey(rect: Rect, key: ArrowKey, modifiers: { shift: boolean; alt: boolean }): Rect {
  const [dx, dy] = directions[key];
  const step = modifiers.shift ? BIG_STEP : GRID;
  if (modifiers.alt) return resizeTo(rect, rect.width + dx * step, rect.height + dy * step);
  return moveBy(rect, dx * step, dy * step);
}

export function isOnCanvas(rect: Rect): boolean {
  return (
    rect.x >= 0 &&
    rect.y >= 0 &&
    rect.width >= MIN_SIZE &&
    rect.height >= MIN_SIZE &&
    rect.x + rect.width <= CANVAS.width &&
    rect.y + rect.height <= CANVAS.height
  );
}

function overlaps(a: Rect, b: Rect): boolean {
  return a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;
}

/**
 * The first grid spot, reading left to right and top to bottom, where a new swatch of this size
 * overlaps nothing; when the canvas is full, the top-left corner (the designer moves it).
 */
export function findFreeSpot(taken: readonly Rect[], width: number, height: number): Rect {
  for (let y = 0; y + height <= CANVAS.height; y += GRID) {
    for (let x = 0; x + width <= CANVAS.width; x += GRID) {
      const rect = { x, y, width, height };
      if (!taken.some((t) => overlaps(rect, t))) return rect;
    }
  }
  return fitToCanvas({ x: 0, y: 0, width, height });
}
