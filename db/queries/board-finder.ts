import { and, asc, eq, isNull, like, or, sql } from "drizzle-orm";
import { db } from "@/db";
import { finishes, suppliers } from "@/db/schema";
import { imageUrl } from "@/lib/uploads/urls";
import type { FinderHit } from "@/lib/boards/types";
import { createColourIndex, toHex } from "@/lib/colour";
import type { Lab } from "@/lib/colour";
import { HttpError } from "@/lib/http";
import type { FinderQuery } from "@/lib/validation/board";
import { openBoard } from "./board-access";
import type { Actor } from "./users";

export const FINDER_LIMIT = 40;
/** How many neighbours "similar colours" lists. */
export const SIMILAR_LIMIT = 12;


function escapeLike(text: string) {
  return text.replace(/[\\%_]/g, (c) => `\\${c}`);
}

/**
 * The board's own small finish picker (the library has its fuller search): the studio's current
 * finishes by words in the name, code, surface or supplier, by category, or nearest in colour
 * (CIEDE2000) to one chosen finish.
 */
export async function findFinishesForBoard(actor: Actor, boardId: string, query: FinderQuery): Promise<{ items: FinderHit[]; total: number }> {
  const { project } = await openBoard(actor, boardId, "edit");
  const words = query.q ? `%${escapeLike(query.q.toLowerCase())}%` : null;
  const rows = await db
    .select({
      id: finishes.id,
      name: finishes.name,
      category: finishes.category,
      productCode: finishes.productCode,
      surface: finishes.surface,
      supplierName: suppliers.name,
      labL: finishes.labL,
      labA: finishes.labA,
      labB: finishes.labB,
      lrv: finishes.lrv,
      lrvSource: finishes.lrvSource,
      imageId: finishes.imageId,
    })
    .from(finishes)
    .leftJoin(suppliers, eq(suppliers.id, finishes.supplierId))
    .where(
      and(
        eq(finishes.studioId, project.studioId),
        isNull(finishes.archivedAt),
        query.category ? eq(finishes.category, query.category) : undefined,
        words
          ? or(
              like(sql`lower(${finishes.name})`, sql`${words} escape '\\'`),
              like(sql`lower(coalesce(${finishes.productCode}, ''))`, sql`${words} escape '\\'`),
              like(sql`lower(coalesce(${finishes.surface}, ''))`, sql`${words} escape '\\'`),
              like(sql`lower(coalesce(${suppliers.name}, ''))`, sql`${words} escape '\\'`),
            )
          : undefined,
      ),
    )
    .orderBy(asc(finishes.category), asc(finishes.name));
  const hits = rows.map((row): FinderHit & { lab: Lab } => {
    const lab: Lab = [row.labL, row.labA, row.labB];
    return {
      id: row.id,
      name: row.name,
      category: row.category,
      productCode: row.productCode,
      surface: row.surface,
      supplierName: row.supplierName,
      hex: toHex(lab),
      lrv: row.lrv,
      lrvSource: row.lrvSource,
      imageUrl: row.imageId ? imageUrl(row.imageId, "400") : null,
      deltaE: null,
      lab,
    };
  });
  const strip = ({ lab: _lab, ...hit }: FinderHit & { lab: Lab }): FinderHit => hit;
  if (!query.near) return { items: hits.slice(0, FINDER_LIMIT).map(strip), total: hits.length };

  const [target] = await db
    .select({ labL: finishes.labL, labA: finishes.labA, labB: finishes.labB })
    .from(finishes)
    .where(and(eq(finishes.id, query.near), eq(finishes.studioId, project.studioId)))
    .limit(1);
  if (!target) throw new HttpError(400, "Choose a finish from your studio's library to find similar colours.", { near: ["Choose a finish from your studio's library."] });
  const index = createColourIndex(hits.map((h) => ({ id: h.id, lab: h.lab })));
  const byId = new Map(hits.map((h) => [h.id, h]));
  const items = index
    .nearest([target.labL, target.labA, target.labB], SIMILAR_LIMIT + 1)
    .filter((hit) => hit.id !== query.near)
    .slice(0, SIMILAR_LIMIT)
    .map((hit) => ({ ...strip(byId.get(hit.id) as FinderHit & { lab: Lab }), deltaE: hit.deltaE }));
  return { items, total: items.length };
}
