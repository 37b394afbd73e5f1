import { and, eq, getTableColumns, sql } from "drizzle-orm";
import { db } from "@/db";
import { writeTransaction } from "./serial-write";
import { boardItems, finishes, fixedItems, images, optionLines, specLines, suppliers, type NewFinish } from "@/db/schema";
import { forbidden, HttpError, notFound } from "@/lib/http";
import { imageUrl } from "@/lib/uploads/urls";
import { settleColour, type ColourBasis } from "@/lib/validation/finish-colour";
import type { FinishInput, FinishPatch } from "@/lib/validation/finish";
import { writeAudit } from "./audit";
import { toFinishSummary, type FinishDetail, type FinishUsage } from "./finish-dto";
import type { Actor } from "./users";

/** The library belongs to a studio; only its staff reach these queries (routes check the role first). */
export function requireStudioId(actor: Actor): string {
  if (!actor.studio) throw forbidden();
  return actor.studio.id;
}

const badField = (field: string, message: string) => new HttpError(400, message, { [field]: [message] });

async function findOwnFinish(studioId: string, finishId: string) {
  const [row] = await db
    .select({ ...getTableColumns(finishes), supplierName: suppliers.name })
    .from(finishes)
    .leftJoin(suppliers, eq(suppliers.id, finishes.supplierId))
    .where(and(eq(finishes.id, finishId), eq(finishes.studioId, studioId)));
  // Another studio's finish is "not found", never "forbidden": its existence is not ours to know.
  if (!row) throw notFound("That finish");
  return row;
}

type Reader = Pick<typeof db, "select">;

export async function countFinishUsage(finishId: string, reader: Reader = db): Promise<FinishUsage> {
  const count = async (table: typeof boardItems | typeof optionLines | typeof fixedItems | typeof specLines) => {
    const [row] = await reader.select({ n: sql<number>`count(*)` }).from(table).where(eq(table.finishId, finishId));
    return Number(row?.n ?? 0);
  };
  const [boardCount, optionCount, fixedCount, specCount] = await Promise.all([
    count(boardItems),
    count(optionLines),
    count(fixedItems),
    count(specLines),
  ]);
  return { boardItems: boardCount, optionLines: optionCount, fixedItems: fixedCount, specLines: specCount };
}

export async function getFinish(actor: Actor, finishId: string): Promise<FinishDetail> {
  const row = await findOwnFinish(requireStudioId(actor), finishId);
  const [image, usage] = await Promise.all([
    row.imageId ? db.query.images.findFirst({ where: eq(images.id, row.imageId) }) : undefined,
    countFinishUsage(row.id),
  ]);
  return {
    ...toFinishSummary(row),
    careNotes: row.careNotes,
    image: image
      ? { id: image.id, width: image.width, height: image.height, url: imageUrl(image.id, "1600"), thumbUrl: imageUrl(image.id, "400") }
      : null,
    usage,
  };
}

/** A supplier and a photo named in a finish must be this studio's own. */
async function checkReferences(studioId: string, refs: { supplierId?: string | null; imageId?: string | null }) {
  if (refs.supplierId) {
    const supplier = await db.query.suppliers.findFirst({ where: and(eq(suppliers.id, refs.supplierId), eq(suppliers.studioId, studioId)) });
    if (!supplier) throw badField("supplierId", "Choose one of your studio's suppliers.");
    if (supplier.archivedAt) throw badField("supplierId", `${supplier.name} is archived; bring it back in Suppliers first, or choose another.`);
  }
  if (refs.imageId) {
    const image = await db.query.images.findFirst({ where: and(eq(images.id, refs.imageId), eq(images.studioId, studioId)) });
    if (!image) throw badField("imageId", "That photo wasn't found; upload it again.");
  }
}

const needsLrv = () => badField("lrv", "Enter the maker's LRV, or give a colour or a photo.");

export async function createFinish(actor: Actor, input: FinishInput): Promise<FinishDetail> {
  const studioId = requireStudioId(actor);
  await checkReferences(studioId, input);
  const settled = settleColour(input.colour, input.lrv ?? null);
  if (!settled) throw needsLrv();
  const { colour: _colour, lrv: _lrv, ...fields } = input;
  const id = await writeTransaction(async (tx) => {
    const [row] = await tx
      .insert(finishes)
      .values({
        ...fields,
        studioId,
        labL: settled.lab[0],
        labA: settled.lab[1],
        labB: settled.lab[2],
        colourSource: settled.colourSource,
        lrv: settled.lrv,
        lrvSource: settled.lrvSource,
      })
      .returning({ id: finishes.id });
    if (!row) throw new Error("finish insert returned nothing");
    await writeAudit({ studioId, actorId: actor.userId, action: "finish.created", entityType: "finish", entityId: row.id, detail: { name: input.name } }, tx);
    return row.id;
  });
  return getFinish(actor, id);
}

type FinishRow = Awaited<ReturnType<typeof findOwnFinish>>;

/** New colour and LRV columns when a patch touches either; a published LRV stays unless the patch changes it. */
function settlePatchedColour(existing: FinishRow, patch: FinishPatch): Partial<NewFinish> {
  if (patch.colour === undefined && patch.lrv === undefined) return {};
  const basis: ColourBasis = patch.colour ?? { source: existing.colourSource, lab: [existing.labL, existing.labA, existing.labB] };
  if (basis.source === "photo" && !(patch.imageId ?? existing.imageId)) throw badField("imageId", "Add a photo to measure the colour from.");
  const published = patch.lrv !== undefined ? patch.lrv : existing.lrvSource === "published" ? existing.lrv : null;
  const settled = settleColour(basis, published);
  if (!settled) throw needsLrv();
  const [labL, labA, labB] = settled.lab;
  return { labL, labA, labB, colourSource: settled.colourSource, lrv: settled.lrv, lrvSource: settled.lrvSource };
}

export async function updateFinish(actor: Actor, finishId: string, patch: FinishPatch): Promise<FinishDetail> {
  const studioId = requireStudioId(actor);
  const existing = await findOwnFinish(studioId, finishId);
  await checkReferences(studioId, patch);
  const { colour: _colour, lrv: _lrv, archived, ...fields } = patch;
  const values: Partial<NewFinish> = { ...fields, ...settlePatchedColour(existing, patch) };
  if (archived !== undefined && archived !== (existing.archivedAt !== null)) values.archivedAt = archived ? new Date() : null;
  if (Object.keys(values).length === 0) return getFinish(actor, finishId);
  const action = archived === true ? "finish.archived" : archived === false ? "finish.restored" : "finish.updated";
  await writeTransaction(async (tx) => {
    await tx.update(finishes).set(values).where(and(eq(finishes.id, finishId), eq(finishes.studioId, studioId)));
    await writeAudit({ studioId, actorId: actor.userId, action, entityType: "finish", entityId: finishId, detail: { fields: Object.keys(values) } }, tx);
  });
  return getFinish(actor, finishId);
}

/** Why a finish can't leave the library, in plain words; null when nothing uses it. */
export function describeRemovalBlock(usage: FinishUsage): string | null {
  if (usage.specLines > 0) {
    return "This finish is in an issued specification, so it can never be removed. Archive it to keep it out of new work.";
  }
  if (usage.boardItems + usage.optionLines + usage.fixedItems > 0) {
    return "This finish is on a sample board, a decision or a fixed item, so it can't be removed. Archive it to keep it out of new work.";
  }
  return null;
}

/** Removes a finish nothing uses (a mistaken entry). Anything in use is archived instead: 409. */
export async function deleteFinish(actor: Actor, finishId: string): Promise<void> {
  const studioId = requireStudioId(actor);
  const existing = await findOwnFinish(studioId, finishId);
  // Checked inside the write transaction, so nothing can start using it between check and delete.
  await writeTransaction(async (tx) => {
    const block = describeRemovalBlock(await countFinishUsage(finishId, tx));
    if (block) throw new HttpError(409, block);
    await tx.delete(finishes).where(and(eq(finishes.id, finishId), eq(finishes.studioId, studioId)));
    await writeAudit({ studioId, actorId: actor.userId, action: "finish.deleted", entityType: "finish", entityId: finishId, detail: { name: existing.name } }, tx);
  });
}
