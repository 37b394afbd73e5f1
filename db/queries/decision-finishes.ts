import { asc, eq, and, isNull } from "drizzle-orm";
import { db } from "@/db";
import { boards, finishes, suppliers } from "@/db/schema";
import { toHex } from "@/lib/colour";
import type { PickerFinish } from "@/lib/decisions/types";



/** The studio's current library, for the option editor's finish picker. */
export async function listFinishesForPicker(studioId: string): Promise<PickerFinish[]> {
  const rows = await db
    .select({ finish: finishes, supplierName: suppliers.name })
    .from(finishes)
    .leftJoin(suppliers, eq(suppliers.id, finishes.supplierId))
    .where(and(eq(finishes.studioId, studioId), isNull(finishes.archivedAt)))
    .orderBy(asc(finishes.category), asc(finishes.name));
  return rows.map(({ finish: f, supplierName }) => ({
    id: f.id,
    name: f.name,
    category: f.category,
    productCode: f.productCode,
    surface: f.surface,
    supplierName,
    unit: f.unit,
    unitPriceCents: f.unitPriceCents,
    leadTimeDays: f.leadTimeDays,
    hex: toHex([f.labL, f.labA, f.labB]),
  }));
}

export async function listBoardsForPicker(projectId: string) {
  return db.select({ id: boards.id, name: boards.name, roomId: boards.roomId }).from(boards).where(eq(boards.projectId, projectId)).orderBy(asc(boards.name));
}
