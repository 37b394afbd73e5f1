import { and, eq, getTableColumns, inArray, isNull, sql } from "drizzle-orm";
import { db } from "@/db";
import { finishes, suppliers } from "@/db/schema";
import { createColourIndex, type ColourIndex } from "@/lib/colour";
import { notFound } from "@/lib/http";
import { toFinishSummary, type FinishSummary } from "./finish-dto";
import { requireStudioId } from "./finishes";
import type { Actor } from "./users";

type CachedIndex = { version: string; index: ColourIndex; categoryOf: Map<string, string> };

// One ΔE00 index per studio, rebuilt only when its current finishes change. The version is cheap
// (one aggregate over the studio's rows): an insert, edit, archive or restore moves the newest
// updated_at and the sum, a delete the count and the sum.
const indexes = new Map<string, CachedIndex>();

async function readVersion(studioId: string): Promise<string> {
  const [row] = await db
    .select({
      n: sql<number>`count(*)`,
      newest: sql<number | null>`max(${finishes.updatedAt})`,
      sum: sql<number>`total(${finishes.updatedAt})`,
    })
    .from(finishes)
    .where(and(eq(finishes.studioId, studioId), isNull(finishes.archivedAt)));
  return `${row?.n ?? 0}:${row?.newest ?? 0}:${row?.sum ?? 0}`;
}

async function readIndex(studioId: string): Promise<CachedIndex> {
  const version = await readVersion(studioId);
  const cached = indexes.get(studioId);
  if (cached?.version === version) return cached;
  const rows = await db
    .select({ id: finishes.id, category: finishes.category, labL: finishes.labL, labA: finishes.labA, labB: finishes.labB })
    .from(finishes)
    .where(and(eq(finishes.studioId, studioId), isNull(finishes.archivedAt)));
  const index = createColourIndex(rows.map((r) => ({ id: r.id, lab: [r.labL, r.labA, r.labB] as const })));
  const fresh = { version, index, categoryOf: new Map(rows.map((r) => [r.id, r.category])) };
  indexes.set(studioId, fresh);
  return fresh;
}

/** The studio's current (not archived) finishes as a colour index, from the cache when it is still right. */
export async function getColourIndex(studioId: string): Promise<ColourIndex> {
  return (await readIndex(studioId)).index;
}

export type SimilarFinish = FinishSummary & { deltaE: number };

/**
 * Current finishes within maxDeltaE (CIEDE2000) of this one, nearest first, itself left out. A
 * substitute must do the same job, so only the finish's own category is offered (a benchtop is
 * never offered a sink or a pendant of the same colour) unless `anyCategory` asks for all.
 */
export async function listSimilarFinishes(
  actor: Actor,
  finishId: string,
  maxDeltaE: number,
  limit: number,
  { anyCategory = false }: { anyCategory?: boolean } = {},
): Promise<SimilarFinish[]> {
  const studioId = requireStudioId(actor);
  const target = await db.query.finishes.findFirst({ where: and(eq(finishes.id, finishId), eq(finishes.studioId, studioId)) });
  if (!target) throw notFound("That finish");
  const { index, categoryOf } = await readIndex(studioId);
  const hits = index
    .within([target.labL, target.labA, target.labB], maxDeltaE)
    .filter((h) => h.id !== finishId && (anyCategory || categoryOf.get(h.id) === target.category))
    .slice(0, limit);
  if (hits.length === 0) return [];
  const rows = await db
    .select({ ...getTableColumns(finishes), supplierName: suppliers.name })
    .from(finishes)
    .leftJoin(suppliers, eq(suppliers.id, finishes.supplierId))
    .where(inArray(finishes.id, hits.map((h) => h.id)));
  const byId = new Map(rows.map((r) => [r.id, r]));
  return hits.flatMap((h) => {
    const row = byId.get(h.id);
    return row ? [{ ...toFinishSummary(row), deltaE: Math.round(h.deltaE * 100) / 100 }] : [];
  });
}

/** For tests: forget every cached index. */
export function clearColourIndexCache(): void {
  indexes.clear();
}
