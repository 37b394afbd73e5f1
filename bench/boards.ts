// Sample board benchmark: `npx tsx --conditions=react-server bench/boards.ts`.
// The board JSON with checks for a 60-swatch board: the pure computation, and the whole query
// (rows from libSQL, checks, proposals) as GET /api/boards/:id runs it. Target: a few milliseconds.
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { pathToFileURL } from "node:url";
import { assessPair, defaultThresholds, parseColour } from "../lib/colour";
import { assembleBoardView, type ItemRow } from "../lib/boards/view";
import type { BoardPairView } from "../lib/boards/types";
import type { BenchRow } from "./table";

const SWATCHES = 60;
const LABELS = ["Benchtop", "Base cabinets", "Tall cabinets", "Splashback", "Floor", "Kickboard", "Wall", "Handles", "Tapware", "Pendant"];

function createRandom(seed: number) {
  let s = seed >>> 0;
  return () => {
    s = (s + 0x6d2b79f5) >>> 0;
    let r = Math.imul(s ^ (s >>> 15), 1 | s);
    r = (r + Math.imul(r ^ (r >>> 7), 61 | r)) ^ r;
    return ((r ^ (r >>> 14)) >>> 0) / 4294967296;
  };
}

function createRows(pairCount: number): { items: ItemRow[]; pairs: BoardPairView[] } {
  const random = createRandom(7);
  const items: ItemRow[] = Array.from({ length: SWATCHES }, (_, i) => {
    const [labL, labA, labB] = parseColour(`#${Math.floor(random() * 0xffffff).toString(16).padStart(6, "0")}`);
    return {
      id: `item-${i}`, label: LABELS[i % LABELS.length] ?? "Wall", x: (i % 10) * 120, y: Math.floor(i / 10) * 120, width: 100, height: 100,
      sortOrder: i, finishId: `finish-${i}`, finishName: `Finish ${i}`, category: "stone", productCode: `B-${i}`, surface: "honed",
      labL, labA, labB, lrv: 5 + random() * 85, lrvSource: "published", imageUrl: null, cautions: [], archived: false,
    };
  });
  const pairs: BoardPairView[] = Array.from({ length: pairCount }, (_, n) => {
    const a = n % SWATCHES;
    const b = (a + 1 + Math.floor(n / SWATCHES)) % SWATCHES;
    return { id: `pair-${n}`, itemAId: `item-${a}`, itemBId: `item-${b}`, intent: n % 2 ? "match" : "contrast", accessRelevant: n % 5 === 0 };
  });
  return { items, pairs };
}

function measureMedianMs(runs: number, fn: () => unknown): number {
  const times: number[] = [];
  for (let r = 0; r < runs; r++) {
    const start = performance.now();
    fn();
    times.push(performance.now() - start);
  }
  times.sort((x, y) => x - y);
  return times[times.length >> 1] ?? NaN;
}

function benchCompute(pairCount: number, cct: number): BenchRow {
  const { items, pairs } = createRows(pairCount);
  const input = {
    board: { id: "b", name: "Bench", version: 1, updatedAt: new Date() }, project: { id: "p", name: "P" }, room: { id: "r", name: "Kitchen" },
    access: "edit" as const, items, pairs, cct, thresholds: defaultThresholds, settingsIgnored: false,
  };
  measureMedianMs(50, () => JSON.stringify(assembleBoardView(input)));
  const ours = measureMedianMs(300, () => JSON.stringify(assembleBoardView(input)));
  // Baseline: the bare assessPair calls the checks are made of, nothing else.
  const labs = new Map(items.map((i) => [i.id, [i.labL, i.labA, i.labB] as const]));
  const baseline = measureMedianMs(300, () =>
    pairs.map((p) => assessPair({ a: { lab: labs.get(p.itemAId) ?? [0, 0, 0] }, b: { lab: labs.get(p.itemBId) ?? [0, 0, 0] }, intent: p.intent, accessRelevant: p.accessRelevant })),
  );
  return {
    measure: `board JSON, ${SWATCHES} swatches, ${pairCount} pairs, ${cct === 6504 ? "daylight" : `${cct} K`} (computed + serialised)`,
    ours: `${ours.toFixed(2)} ms`, baseline: `${baseline.toFixed(2)} ms (bare assessPair calls)`, ratio: `${(ours / baseline).toFixed(1)}×`,
    target: "≤ 5 ms", met: ours <= 5 ? "yes" : "no",
  };
}

/** The whole GET path below the HTTP layer: libSQL rows, thresholds, checks, proposals. */
async function benchQuery(): Promise<BenchRow> {
  const dir = mkdtempSync(path.join(tmpdir(), "mottle-bench-boards-"));
  process.env.DATABASE_URL = `file:${path.join(dir, "bench.db")}`;
  try {
    const { migrateDatabase } = await import("../db/migrate");
    const { seedDemo } = await import("../db/seed/demo");
    const { client, db } = await migrateDatabase(process.env.DATABASE_URL);
    await seedDemo(db);
    const finishes = await client.execute("select id from finish where studio_id = 'demo-studio-fernleaf' order by id");
    const ids = finishes.rows.map((r) => String(r.id));
    const items = Array.from({ length: SWATCHES }, (_, i) => `('bench-item-${i}', 'demo-board-kitchen-a', '${ids[i % ids.length]}', 'Wall', ${(i % 10) * 120}, ${Math.floor(i / 10) * 120}, 100, 100, ${i + 20})`);
    await client.execute("delete from board_item where board_id = 'demo-board-kitchen-a'");
    await client.execute(`insert into board_item (id, board_id, finish_id, label, x, y, width, height, sort_order) values ${items.join(", ")}`);
    const pairs = Array.from({ length: SWATCHES - 1 }, (_, i) => `('bench-pair-${i}', 'demo-board-kitchen-a', 'bench-item-${i}', 'bench-item-${i + 1}', '${i % 2 ? "match" : "contrast"}', ${i % 7 === 0 ? 1 : 0})`);
    await client.execute(`insert into adjacency (id, board_id, item_a_id, item_b_id, intent, access_relevant) values ${pairs.join(", ")}`);
    client.close();
    const { getBoardView } = await import("../db/queries/boards");
    const { getActor } = await import("../db/queries/users");
    const actor = await getActor("demo-user-designer");
    if (!actor) throw new Error("no demo designer");
    const { getProjectForActor } = await import("../db/queries/projects");
    const timeRuns = async (fn: (i: number) => Promise<unknown>) => {
      for (let i = 0; i < 30; i++) await fn(i);
      const times: number[] = [];
      for (let i = 0; i < 200; i++) {
        const start = performance.now();
        await fn(i);
        times.push(performance.now() - start);
      }
      return times.sort((x, y) => x - y);
    };
    // Every read a miss: the cache (read-cache.ts) is made stale before each one, as a write would.
    const { markWritten } = await import("../db/queries/read-cache");
    const times = await timeRuns(async (i) => {
      markWritten();
      return JSON.stringify(await getBoardView(actor, "demo-board-kitchen-a", i % 2 ? 2700 : 6504));
    });
    // Baseline: one small query of the same kind (a project by id, with the permission check), so
    // a busy machine shows up in both columns.
    const base = await timeRuns(() => getProjectForActor(actor, "demo-project-marrow"));
    const median = times[times.length >> 1] ?? NaN;
    const p95 = times[Math.floor(times.length * 0.95)] ?? NaN;
    const baseMedian = base[base.length >> 1] ?? NaN;
    return {
      measure: `getBoardView, ${SWATCHES} swatches, ${SWATCHES - 1} pairs, from libSQL, uncached (median; p95)`,
      ours: `${median.toFixed(2)} ms; ${p95.toFixed(2)} ms`, baseline: `${baseMedian.toFixed(2)} ms (one project read)`,
      ratio: `${(median / baseMedian).toFixed(1)}×`, target: "≤ 5 ms median", met: median <= 5 ? "yes" : "no",
    };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

export async function runBoardsBench(): Promise<BenchRow[]> {
  return [benchCompute(SWATCHES - 1, 6504), benchCompute(SWATCHES - 1, 2700), benchCompute(180, 2700), await benchQuery()];
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  const { printTable } = await import("./table");
  printTable(await runBoardsBench());
}
