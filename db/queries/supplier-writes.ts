import { and, eq, inArray, ne } from "drizzle-orm";
import { supplierContacts, suppliers } from "@/db/schema";
import { HttpError } from "@/lib/http";
import type { SupplierContactInput, SupplierInput, SupplierPatch } from "@/lib/validation/supplier";
import { writeAudit } from "./audit";
import { requireStudioId } from "./finishes";
import { writeTransaction, type Tx } from "./serial-write";
import type { SupplierDetail } from "./supplier-dto";
import { countSupplierUsage, describeSupplierBlock } from "./supplier-usage";
import { findOwnSupplier, getSupplier, listContactIds } from "./suppliers";
import type { Actor } from "./users";

const sameName = (a: string, b: string) => a.trim().toLowerCase() === b.trim().toLowerCase();

/** Names are matched loosely (the CSV import finds suppliers by name), so two alike would be ambiguous. */
async function assertNameFree(tx: Tx, studioId: string, name: string, exceptId?: string) {
  const others = await tx
    .select({ name: suppliers.name, archivedAt: suppliers.archivedAt })
    .from(suppliers)
    .where(exceptId ? and(eq(suppliers.studioId, studioId), ne(suppliers.id, exceptId)) : eq(suppliers.studioId, studioId));
  const twin = others.find((o) => sameName(o.name, name));
  if (!twin) return;
  const message = twin.archivedAt
    ? `Your studio already has an archived supplier called ${twin.name}. Bring it back instead, or use another name.`
    : `Your studio already has a supplier called ${twin.name}. Use another name, or edit that one.`;
  throw new HttpError(409, message, { name: [message] });
}

/** Replaces the contact list: listed ids of this supplier are kept and changed, new rows added, the rest removed. */
async function replaceContacts(tx: Tx, supplierId: string, contacts: SupplierContactInput[]) {
  const existing = await listContactIds(supplierId, tx);
  const kept = new Set<string>();
  for (const [sortOrder, { id, ...fields }] of contacts.entries()) {
    if (id && existing.has(id) && !kept.has(id)) {
      kept.add(id);
      await tx.update(supplierContacts).set({ ...fields, sortOrder }).where(eq(supplierContacts.id, id));
    } else {
      await tx.insert(supplierContacts).values({ ...fields, sortOrder, supplierId });
    }
  }
  const gone = [...existing].filter((id) => !kept.has(id));
  if (gone.length) await tx.delete(supplierContacts).where(and(eq(supplierContacts.supplierId, supplierId), inArray(supplierContacts.id, gone)));
}

export async function createSupplier(actor: Actor, input: SupplierInput): Promise<SupplierDetail> {
  const studioId = requireStudioId(actor);
  const { contacts, ...fields } = input;
  const id = await writeTransaction(async (tx) => {
    await assertNameFree(tx, studioId, fields.name);
    const [row] = await tx.insert(suppliers).values({ ...fields, studioId }).returning({ id: suppliers.id });
    if (!row) throw new Error("supplier insert returned nothing");
    await replaceContacts(tx, row.id, contacts.map(({ id: _id, ...c }) => c));
    await writeAudit(
      { studioId, actorId: actor.userId, action: "supplier.created", entityType: "supplier", entityId: row.id, detail: { name: fields.name, contacts: contacts.length } },
      tx,
    );
    return row.id;
  });
  return getSupplier(actor, id);
}

export async function updateSupplier(actor: Actor, supplierId: string, patch: SupplierPatch): Promise<SupplierDetail> {
  const studioId = requireStudioId(actor);
  const existing = await findOwnSupplier(studioId, supplierId);
  const { contacts, archived, ...fields } = patch;
  const values: Partial<typeof suppliers.$inferInsert> = { ...fields };
  if (archived !== undefined && archived !== (existing.archivedAt !== null)) values.archivedAt = archived ? new Date() : null;
  if (Object.keys(values).length === 0 && contacts === undefined) return getSupplier(actor, supplierId);
  const action = values.archivedAt ? "supplier.archived" : values.archivedAt === null ? "supplier.restored" : "supplier.updated";
  await writeTransaction(async (tx) => {
    if (fields.name !== undefined) await assertNameFree(tx, studioId, fields.name, supplierId);
    if (Object.keys(values).length) await tx.update(suppliers).set(values).where(and(eq(suppliers.id, supplierId), eq(suppliers.studioId, studioId)));
    if (contacts !== undefined) await replaceContacts(tx, supplierId, contacts);
    const changed = [...Object.keys(values), ...(contacts !== undefined ? ["contacts"] : [])];
    await writeAudit({ studioId, actorId: actor.userId, action, entityType: "supplier", entityId: supplierId, detail: { fields: changed } }, tx);
  });
  return getSupplier(actor, supplierId);
}

/** Deletes a supplier nothing names (a mistaken entry); anything in use is archived instead: 409. */
export async function deleteSupplier(actor: Actor, supplierId: string): Promise<void> {
  const studioId = requireStudioId(actor);
  const existing = await findOwnSupplier(studioId, supplierId);
  // Checked inside the write transaction, so nothing can start using it between check and delete.
  await writeTransaction(async (tx) => {
    const block = describeSupplierBlock(existing.name, await countSupplierUsage(supplierId, tx));
    if (block) throw new HttpError(409, block);
    await tx.delete(supplierContacts).where(eq(supplierContacts.supplierId, supplierId));
    await tx.delete(suppliers).where(and(eq(suppliers.id, supplierId), eq(suppliers.studioId, studioId)));
    await writeAudit({ studioId, actorId: actor.userId, action: "supplier.deleted", entityType: "supplier", entityId: supplierId, detail: { name: existing.name } }, tx);
  });
}
