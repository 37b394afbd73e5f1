import type { Lab } from "@/lib/colour";
import type { BoardCheck, VerdictCounts } from "./board-checks";
import type { PairIntent, ProposedPair } from "./proposed-pairs";

export type LrvSource = "published" | "photo" | "computed";

/** A finish as a board shows it: enough to paint the swatch, caption it and check it. */
export type BoardFinish = {
  id: string;
  name: string;
  category: string;
  productCode: string | null;
  surface: string | null;
  lab: Lab;
  /** The stored colour in daylight, "#rrggbb". */
  hex: string;
  /** The same colour under the light the board is viewed under. */
  tint: string;
  lrv: number;
  lrvSource: LrvSource;
  imageUrl: string | null;
  cautions: string[];
  archived: boolean;
};

export type BoardItemView = {
  id: string;
  label: string;
  x: number;
  y: number;
  width: number;
  height: number;
  sortOrder: number;
  finish: BoardFinish;
};

export type BoardPairView = { id: string; itemAId: string; itemBId: string; intent: PairIntent; accessRelevant: boolean };

/** GET /api/boards/:id, and what every write answers with. */
export type BoardView = {
  board: { id: string; name: string; version: number; updatedAt: string };
  project: { id: string; name: string };
  room: { id: string; name: string };
  /** What the person asking may do: staff edit, the project's clients read. */
  access: "edit" | "read";
  canvas: { width: number; height: number; grid: number };
  light: { id: string; label: string; cct: number };
  items: BoardItemView[];
  pairs: BoardPairView[];
  /** One per pair, worst first. */
  checks: BoardCheck[];
  counts: VerdictCounts;
  proposals: ProposedPair[];
  /** True when the studio's own check settings could not be used and the defaults judged instead. */
  settingsIgnored: boolean;
  cautions: { screen: string; access: string; lrvUnderLight: string };
};

export type BoardSummary = {
  id: string;
  name: string;
  roomId: string;
  version: number;
  updatedAt: string;
  itemCount: number;
  pairCount: number;
  counts: VerdictCounts;
  /** Up to six colours for a small preview strip, in stacking order. */
  preview: string[];
};

export type BoardList = {
  project: { id: string; name: string };
  access: "edit" | "read";
  rooms: { id: string; name: string; boards: BoardSummary[] }[];
};

/** One finish the board's picker offers (GET /api/boards/:id/finishes). */
export type FinderHit = {
  id: string;
  name: string;
  category: string;
  productCode: string | null;
  surface: string | null;
  supplierName: string | null;
  hex: string;
  lrv: number;
  lrvSource: LrvSource;
  imageUrl: string | null;
  /** ΔE00 from the finish the designer asked for similar colours to. */
  deltaE: number | null;
};
