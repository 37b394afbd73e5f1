import { and, asc, eq, inArray, isNull } from "drizzle-orm";
import { db } from "@/db";
import { supplierContacts, suppliers, type Supplier, type SupplierContact } from "@/db/schema";
import { notFound } from "@/lib/http";
import { requireStudioId } from "./finishes";
import { toSupplierView, type SupplierDetail, type SupplierView } from "./supplier-dto";
import { countSupplierUsage } from "./supplier-usage";
import type { Actor } from "./users";

type Reader = Pick<typeof db, "select">;

/** The studio's suppliers that may be offered for new work (finish form, library filter, invites); archived ones are left out. */
export async function listActiveSuppliers(studioId: string): Promise<Supplier[]> {
  return db
    .select()
    .from(suppliers)
    .where(and(eq(suppliers.studioId, studioId), isNull(suppliers.archivedAt)))
    .orderBy(asc(suppliers.name), asc(suppliers.id));
}

async function contactsOf(supplierIds: string[], reader: Reader = db): Promise<Map<string, SupplierContact[]>> {
  const bySupplier = new Map<string, SupplierContact[]>();
  if (supplierIds.length === 0) return bySupplier;
  const rows = await reader
    .select()
    .from(supplierContacts)
    .where(inArray(supplierContacts.supplierId, supplierIds))
    .orderBy(asc(supplierContacts.sortOrder), asc(supplierContacts.createdAt), asc(supplierContacts.id));
  for (const row of rows) bySupplier.set(row.supplierId, [...(bySupplier.get(row.supplierId) ?? []), row]);
  return bySupplier;
}

/** The studio's directory with each supplier's contacts, by name; archived ones only when asked for. */
export async function listStudioSuppliers(actor: Actor, { archived = false }: { archived?: boolean } = {}): Promise<SupplierView[]> {
  const studioId = requireStudioId(actor);
  const rows = await db
    .select()
    .from(suppliers)
    .where(archived ? eq(suppliers.studioId, studioId) : and(eq(suppliers.studioId, studioId), isNull(suppliers.archivedAt)))
    .orderBy(asc(suppliers.name), asc(suppliers.id));
  const contacts = await contactsOf(rows.map((r) => r.id));
  return rows.map((r) => toSupplierView(r, contacts.get(r.id) ?? []));
}

/** One of the studio's suppliers; another studio's is "not found", never "forbidden". */
export async function findOwnSupplier(studioId: string, supplierId: string, reader: Reader = db): Promise<Supplier> {
  const [row] = await reader
    .select()
    .from(suppliers)
    .where(and(eq(suppliers.id, supplierId), eq(suppliers.studioId, studioId)));
  if (!row) throw notFound("That supplier");
  return row;
}

export async function getSupplier(actor: Actor, supplierId: string): Promise<SupplierDetail> {
  const row = await findOwnSupplier(requireStudioId(actor), supplierId);
  const [contacts, usage] = await Promise.all([contactsOf([row.id]), countSupplierUsage(row.id)]);
  return { ...toSupplierView(row, contacts.get(row.id) ?? []), usage };
}

/** The contacts a supplier has now, for a write that replaces the list. */
export async function listContactIds(supplierId: string, reader: Reader = db): Promise<Set<string>> {
  const rows = await reader.select({ id: supplierContacts.id }).from(supplierContacts).where(eq(supplierContacts.supplierId, supplierId));
  return new Set(rows.map((r) => r.id));
}
