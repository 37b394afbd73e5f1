import type { Database } from "@/db/client";
import * as t from "@/db/schema";
import { demoId } from "./ids";

const f = (key: string) => demoId("finish", key);

/** When the designer started the demo's board (demo-activity.ts logs the board's making from here). */
export const DEMO_BOARD_STARTED = "2026-11-03T23:00:00Z";

/**
 * A kitchen sample board laid out on the 1200 × 800 canvas, with the surfaces that meet. Most
 * pairs work; the timber island and the benchtop edge against the timber floor are too close in
 * light reflectance for people with low vision, which is what the checks are there to catch.
 */
export async function seedDemoBoard(db: Database, project: string) {
  const board = demoId("board", "kitchen-a");
  await db.insert(t.boards).values([
    { id: board, projectId: project, roomId: demoId("room", "kitchen"), name: "Kitchen: warm limestone scheme", createdAt: new Date(DEMO_BOARD_STARTED) },
  ]).onConflictDoNothing();
  const items = [
    ["benchtop", "Benchtop", "saltbush", 40, 40, 360, 240],
    ["base", "Base cabinets", "cab-sage", 420, 40, 300, 240],
    ["tall", "Tall cabinets", "cab-chalk", 740, 40, 220, 360],
    ["island", "Island feature panel", "cab-oak-natural", 40, 300, 260, 200],
    ["splash", "Splashback", "saltbush", 320, 300, 200, 200],
    ["floor", "Floor", "floor-oak-herringbone", 540, 420, 300, 200],
    ["kick", "Kickboard", "cab-ink", 860, 420, 140, 80],
    ["pendant", "Pendant", "light-pendant-opal", 980, 40, 160, 160],
    ["handles", "Handles", "hw-pull-brass", 980, 220, 120, 120],
    ["tap", "Tapware", "tap-mixer-brass", 1020, 540, 140, 140],
  ] as const;
  await db.insert(t.boardItems).values(
    items.map(([key, label, finish, x, y, width, height], i) => ({
      id: demoId("item", key), boardId: board, finishId: f(finish), label, x, y, width, height, sortOrder: i,
    })),
  ).onConflictDoNothing();
  const pairs = [
    ["bench-base", "benchtop", "base", "contrast", false],
    ["splash-bench", "splash", "benchtop", "match", false],
    ["tall-base", "tall", "base", "contrast", false],
    ["floor-kick", "floor", "kick", "contrast", true],
    ["bench-edge-floor", "benchtop", "floor", "contrast", true],
    ["island-floor", "island", "floor", "contrast", true],
  ] as const;
  await db.insert(t.adjacencies).values(
    pairs.map(([key, a, b, intent, accessRelevant]) => ({
      id: demoId("pair", key), boardId: board, itemAId: demoId("item", a), itemBId: demoId("item", b), intent, accessRelevant,
    })),
  ).onConflictDoNothing();
}
