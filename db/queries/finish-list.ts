import { and, asc, eq, getTableColumns, inArray, isNotNull, isNull, or, sql, type AnyColumn, type SQL } from "drizzle-orm";
import { db } from "@/db";
import { finishes, suppliers } from "@/db/schema";
import { encodeJson, type JsonBytes } from "@/lib/http";
import type { FinishListQuery, FinishSortKey } from "@/lib/validation/finish";
import { toFinishSummary, type FinishPage } from "./finish-dto";
import { readCache } from "./read-cache";

/** LIKE pattern for text typed by a person: % and _ are literal, matched anywhere, any case (ASCII). */
function containing(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

function matchesText(q: string): SQL | undefined {
  if (!q) return undefined;
  const pattern = containing(q);
  const like = (column: AnyColumn) => sql`${column} like ${pattern} escape '\\'`;
  return or(like(finishes.name), like(finishes.productCode), like(finishes.surface), like(suppliers.name));
}

const sortColumns: Record<FinishSortKey, SQL> = {
  name: sql`${finishes.name} collate nocase`,
  category: sql`${finishes.category}`,
  supplier: sql`${suppliers.name} collate nocase`,
  code: sql`${finishes.productCode} collate nocase`,
  surface: sql`${finishes.surface} collate nocase`,
  price: sql`${finishes.unitPriceCents}`,
  lead: sql`${finishes.leadTimeDays}`,
  lrv: sql`${finishes.lrv}`,
  updated: sql`${finishes.updatedAt}`,
};

function orderFor(sort: FinishSortKey, dir: "asc" | "desc"): SQL[] {
  const column = sortColumns[sort];
  // Blanks (no supplier, no code) sort last either way; name then id keep pages stable.
  const primary = dir === "asc" ? sql`${column} asc nulls last` : sql`${column} desc nulls last`;
  return [primary, asc(sortColumns.name), asc(finishes.id)];
}

/** Pages already read are kept until the next write (read-cache.ts): a designer paging back and forth, or a team on one library. */
const finishPages = readCache<FinishPage>("finish-page", 200);

const finishPagesJson = readCache<JsonBytes>("finish-page-json", 200);
const pageKey = (studioId: string, query: FinishListQuery) => `${studioId}|${JSON.stringify(query)}`;

/** One page of a studio's library, filtered and sorted as asked. */
export function listFinishes(studioId: string, query: FinishListQuery): Promise<FinishPage> {
  return finishPages(pageKey(studioId, query), () => readFinishPage(studioId, query));
}

/** The same page as UTF-8 JSON, for GET /api/finishes: a repeat read is neither serialised nor encoded again. */
export function listFinishesJson(studioId: string, query: FinishListQuery): Promise<JsonBytes> {
  return finishPagesJson(pageKey(studioId, query), async () => encodeJson(await listFinishes(studioId, query)));
}

/**
 * One page of a studio's library. Sorting 10,000 whole rows is what costs, so the sort runs over
 * ids and sort keys only (the studio filter uses its index), and just the page's rows are read
 * in full afterwards; the count runs beside it.
 */
async function readFinishPage(studioId: string, query: FinishListQuery): Promise<FinishPage> {
  const where = and(
    eq(finishes.studioId, studioId),
    query.status === "current" ? isNull(finishes.archivedAt) : query.status === "archived" ? isNotNull(finishes.archivedAt) : undefined,
    query.category ? eq(finishes.category, query.category) : undefined,
    query.supplier === "none" ? isNull(finishes.supplierId) : query.supplier ? eq(finishes.supplierId, query.supplier) : undefined,
    matchesText(query.q),
  );
  // The supplier's name is only needed to match text or to sort by it.
  const needsSupplier = Boolean(query.q) || query.sort === "supplier";
  const ids = db.select({ id: finishes.id }).from(finishes);
  const counted = db.select({ total: sql<number>`count(*)` }).from(finishes);
  const join = eq(suppliers.id, finishes.supplierId);
  const [pageIds, [count]] = await Promise.all([
    (needsSupplier ? ids.leftJoin(suppliers, join) : ids)
      .where(where)
      .orderBy(...orderFor(query.sort, query.dir))
      .limit(query.pageSize)
      .offset((query.page - 1) * query.pageSize),
    (query.q ? counted.leftJoin(suppliers, join) : counted).where(where),
  ]);
  const rows = pageIds.length
    ? await db
        .select({ ...getTableColumns(finishes), supplierName: suppliers.name })
        .from(finishes)
        .leftJoin(suppliers, join)
        .where(inArray(finishes.id, pageIds.map((r) => r.id)))
    : [];
  const byId = new Map(rows.map((r) => [r.id, r]));
  const items = pageIds.flatMap(({ id }) => {
    const row = byId.get(id);
    return row ? [toFinishSummary(row)] : [];
  });
  return { items, total: Number(count?.total ?? 0), page: query.page, pageSize: query.pageSize };
}
