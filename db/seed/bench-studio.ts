import bcrypt from "bcryptjs";
import type { Database } from "@/db/client";
import * as t from "@/db/schema";
import { finishCategories } from "@/db/schema";
import { lightReflectance } from "@/lib/colour/luminance";

/** Deterministic pseudo-random numbers so every benchmark run measures the same studio. */
function createRandom(seed: number) {
  let s = seed >>> 0;
  return () => {
    s = (s + 0x6d2b79f5) >>> 0;
    let r = Math.imul(s ^ (s >>> 15), 1 | s);
    r = (r + Math.imul(r ^ (r >>> 7), 61 | r)) ^ r;
    return ((r ^ (r >>> 14)) >>> 0) / 4294967296;
  };
}

const id = (kind: string, n: number | string) => `bench-${kind}-${n}`;

async function insertInChunks<T>(rows: T[], insert: (chunk: T[]) => Promise<unknown>, size = 400) {
  for (let i = 0; i < rows.length; i += size) await insert(rows.slice(i, i + size));
}

export const BENCH_SIZES = { projects: 40, finishes: 5000, swatchesPerBoard: 60, decisions: 200 } as const;

/**
 * A studio of realistic size for benchmarks (issue 9): 40 projects, 5,000 finishes, a board of
 * 60 swatches per project, 200 decisions. Invented data; fixed ids, so it can be re-run.
 */
export async function seedBenchStudio(db: Database) {
  const random = createRandom(20261201);
  const studio = id("studio", 1);
  const passwordHash = await bcrypt.hash("mottle-bench", 10);
  await db.insert(t.studios).values({ id: studio, name: "Bench Studio" }).onConflictDoNothing();
  await db.insert(t.users).values([
    { id: id("user", "designer"), email: "designer@bench.example", name: "Bench Designer", passwordHash },
    { id: id("user", "client"), email: "client@bench.example", name: "Bench Client" },
  ]).onConflictDoNothing();
  await db.insert(t.studioMembers).values({ studioId: studio, userId: id("user", "designer"), role: "owner" }).onConflictDoNothing();
  await db.insert(t.suppliers).values({ id: id("supplier", 1), studioId: studio, name: "Bench Supplies", trade: "stone" }).onConflictDoNothing();

  const finishes = Array.from({ length: BENCH_SIZES.finishes }, (_, i) => {
    const L = 5 + random() * 90;
    const a = (random() - 0.5) * 40;
    const b = (random() - 0.3) * 50;
    return {
      id: id("finish", i), studioId: studio, supplierId: id("supplier", 1), name: `Finish ${i} ${["Stone", "Oak", "Clay", "Linen", "Ash"][i % 5]}`,
      category: finishCategories[i % finishCategories.length] ?? "stone", productCode: `BN-${String(i).padStart(5, "0")}`, unit: "m²",
      unitPriceCents: 1000 + Math.floor(random() * 90000), leadTimeDays: 7 + Math.floor(random() * 80),
      labL: L, labA: a, labB: b, colourSource: "published" as const, lrv: Math.round(lightReflectance([L, a, b]) * 10) / 10, lrvSource: "computed" as const,
    };
  });
  await insertInChunks(finishes, (chunk) => db.insert(t.finishes).values(chunk).onConflictDoNothing());

  for (let p = 0; p < BENCH_SIZES.projects; p++) {
    const project = id("project", p);
    await db.insert(t.projects).values({ id: project, studioId: studio, name: `Bench project ${p}`, installDate: "2027-06-01" }).onConflictDoNothing();
    await db.insert(t.rooms).values({ id: id("room", p), projectId: project, name: "Kitchen" }).onConflictDoNothing();
    await db.insert(t.projectMembers).values({ id: id("member", p), projectId: project, userId: id("user", "client"), role: "client" }).onConflictDoNothing();
    await db.insert(t.boards).values({ id: id("board", p), projectId: project, roomId: id("room", p), name: "Scheme" }).onConflictDoNothing();
    const items = Array.from({ length: BENCH_SIZES.swatchesPerBoard }, (_, i) => ({
      id: id(`item-${p}`, i), boardId: id("board", p), finishId: id("finish", Math.floor(random() * BENCH_SIZES.finishes)),
      label: `Surface ${i}`, x: (i % 10) * 115, y: Math.floor(i / 10) * 120, width: 100, height: 100, sortOrder: i,
    }));
    await db.insert(t.boardItems).values(items).onConflictDoNothing();
    const pairs = items.slice(1).map((item, i) => ({
      id: id(`pair-${p}`, i), boardId: id("board", p), itemAId: items[i]?.id ?? item.id, itemBId: item.id,
      intent: i % 2 ? ("match" as const) : ("contrast" as const), accessRelevant: i % 7 === 0,
    }));
    await db.insert(t.adjacencies).values(pairs).onConflictDoNothing();
    for (let d = 0; d < BENCH_SIZES.decisions / BENCH_SIZES.projects; d++) {
      const decision = id(`decision-${p}`, d);
      await db.insert(t.decisions).values({ id: decision, projectId: project, roomId: id("room", p), title: `Choice ${d}`, allowanceCents: 500000, dueDate: "2027-02-01" }).onConflictDoNothing();
      for (let o = 0; o < 3; o++) {
        const option = id(`option-${p}-${d}`, o);
        await db.insert(t.options).values({ id: option, decisionId: decision, label: `Option ${o + 1}`, priceCents: 400000 + o * 50000, sortOrder: o }).onConflictDoNothing();
        await db.insert(t.optionLines).values({ id: id(`line-${p}-${d}`, o), optionId: option, finishId: id("finish", (p * 31 + d * 7 + o) % BENCH_SIZES.finishes), quantity: 5, unit: "m²" }).onConflictDoNothing();
      }
    }
  }
}
