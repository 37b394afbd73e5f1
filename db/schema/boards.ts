import { index, integer, real, sqliteTable, text } from "drizzle-orm/sqlite-core";
import { createdAt, id, updatedAt } from "./columns";
import { finishes } from "./library";
import { projects, rooms } from "./studio";

export const boards = sqliteTable(
  "board",
  {
    id: id(),
    projectId: text("project_id")
      .notNull()
      .references(() => projects.id, { onDelete: "cascade" }),
    roomId: text("room_id")
      .notNull()
      .references(() => rooms.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    /** Bumped on every write; a write based on an older version is refused with 409. */
    version: integer("version").notNull().default(1),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("board_project_idx").on(t.projectId), index("board_room_idx").on(t.roomId)],
);
export type Board = typeof boards.$inferSelect;

/** Positions and sizes are in canvas units (the canvas is 1200 × 800). */
export const boardItems = sqliteTable(
  "board_item",
  {
    id: id(),
    boardId: text("board_id")
      .notNull()
      .references(() => boards.id, { onDelete: "cascade" }),
    finishId: text("finish_id")
      .notNull()
      .references(() => finishes.id, { onDelete: "restrict" }),
    label: text("label").notNull(),
    x: real("x").notNull(),
    y: real("y").notNull(),
    width: real("width").notNull(),
    height: real("height").notNull(),
    sortOrder: integer("sort_order").notNull().default(0),
    createdAt: createdAt(),
  },
  (t) => [index("board_item_board_idx").on(t.boardId)],
);
export type BoardItem = typeof boardItems.$inferSelect;

export const pairIntents = ["match", "contrast"] as const;
export type PairIntent = (typeof pairIntents)[number];

/** Two items on one board whose surfaces meet, and what the meeting is meant to be. */
export const adjacencies = sqliteTable(
  "adjacency",
  {
    id: id(),
    boardId: text("board_id")
      .notNull()
      .references(() => boards.id, { onDelete: "cascade" }),
    itemAId: text("item_a_id")
      .notNull()
      .references(() => boardItems.id, { onDelete: "cascade" }),
    itemBId: text("item_b_id")
      .notNull()
      .references(() => boardItems.id, { onDelete: "cascade" }),
    intent: text("intent", { enum: pairIntents }).notNull(),
    accessRelevant: integer("access_relevant", { mode: "boolean" }).notNull().default(false),
    createdAt: createdAt(),
  },
  (t) => [index("adjacency_board_idx").on(t.boardId)],
);
export type Adjacency = typeof adjacencies.$inferSelect;
