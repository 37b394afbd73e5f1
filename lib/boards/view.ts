import { SCREEN_COLOUR_CAUTION, toHex } from "@/lib/colour";
import type { Lab, Thresholds } from "@/lib/colour";
import { computeBoardChecks, countVerdicts, tintForLight } from "./board-checks";
import { CANVAS, GRID } from "./canvas";
import { DAYLIGHT, findLight } from "./lights";
import { proposePairs } from "./proposed-pairs";
import type { BoardFinish, BoardItemView, BoardPairView, BoardView, LrvSource } from "./types";
import { ACCESS_GUIDANCE, LRV_UNDER_LIGHT_NOTE } from "./words";

/** One board_item row joined with its finish, as the query reads it. */
export type ItemRow = {
  id: string;
  label: string;
  x: number;
  y: number;
  width: number;
  height: number;
  sortOrder: number;
  finishId: string;
  finishName: string;
  category: string;
  productCode: string | null;
  surface: string | null;
  labL: number;
  labA: number;
  labB: number;
  lrv: number;
  lrvSource: LrvSource;
  imageUrl: string | null;
  cautions: string[];
  archived: boolean;
};

type Input = {
  board: { id: string; name: string; version: number; updatedAt: Date };
  project: { id: string; name: string };
  room: { id: string; name: string };
  access: BoardView["access"];
  items: readonly ItemRow[];
  pairs: readonly BoardPairView[];
  cct: number;
  thresholds: Thresholds;
  settingsIgnored: boolean;
};

function toFinish(row: ItemRow, cct: number): BoardFinish {
  const lab: Lab = [row.labL, row.labA, row.labB];
  return {
    id: row.finishId,
    name: row.finishName,
    category: row.category,
    productCode: row.productCode,
    surface: row.surface,
    lab,
    hex: toHex(lab),
    tint: tintForLight(lab, cct),
    lrv: row.lrv,
    lrvSource: row.lrvSource,
    imageUrl: row.imageUrl,
    cautions: row.cautions,
    archived: row.archived,
  };
}

/** Rows in, the board's JSON out: pure, so it is the same on every screen and in the bench. */
export function assembleBoardView(input: Input): BoardView {
  const light = findLight(input.cct) ?? DAYLIGHT;
  const items: BoardItemView[] = [...input.items]
    .sort((p, q) => p.sortOrder - q.sortOrder || (p.id < q.id ? -1 : 1))
    .map((row) => ({
      id: row.id,
      label: row.label,
      x: row.x,
      y: row.y,
      width: row.width,
      height: row.height,
      sortOrder: row.sortOrder,
      finish: toFinish(row, light.cct),
    }));
  const checks = computeBoardChecks(
    items.map((item) => ({ id: item.id, lab: item.finish.lab, lrv: item.finish.lrv })),
    input.pairs,
    light.cct,
    input.thresholds,
  );
  return {
    board: { ...input.board, updatedAt: input.board.updatedAt.toISOString() },
    project: input.project,
    room: input.room,
    access: input.access,
    canvas: { width: CANVAS.width, height: CANVAS.height, grid: GRID },
    light: { id: light.id, label: light.label, cct: light.cct },
    items,
    pairs: [...input.pairs],
    checks,
    counts: countVerdicts(checks),
    proposals: input.access === "edit" ? proposePairs(items, input.pairs) : [],
    settingsIgnored: input.settingsIgnored,
    cautions: { screen: SCREEN_COLOUR_CAUTION, access: ACCESS_GUIDANCE, lrvUnderLight: LRV_UNDER_LIGHT_NOTE },
  };
}
