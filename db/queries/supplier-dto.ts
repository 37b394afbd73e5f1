import type { Supplier, SupplierContact, Trade } from "@/db/schema";

/** A supplier contact as the screens and the API answer it. */
export type SupplierContactView = { id: string; name: string; email: string | null; phone: string | null; role: string | null };

/** A supplier as every screen and route answers it: plain JSON, the same from the page and the API. */
export type SupplierView = {
  id: string;
  name: string;
  trade: Trade;
  email: string | null;
  phone: string | null;
  accountNumber: string | null;
  notes: string | null;
  archived: boolean;
  archivedAt: string | null;
  createdAt: string;
  contacts: SupplierContactView[];
};

/** What holds on to a supplier; anything above zero means it can be archived but not deleted. */
export type SupplierUsage = { finishes: number; specLines: number; projectContacts: number; invitations: number; acknowledgements: number };

export type SupplierDetail = SupplierView & { usage: SupplierUsage };

export function toContactView(c: SupplierContact): SupplierContactView {
  return { id: c.id, name: c.name, email: c.email, phone: c.phone, role: c.role };
}

export function toSupplierView(s: Supplier, contacts: SupplierContact[]): SupplierView {
  return {
    id: s.id,
    name: s.name,
    trade: s.trade,
    email: s.email,
    phone: s.phone,
    accountNumber: s.accountNumber,
    notes: s.notes,
    archived: s.archivedAt !== null,
    archivedAt: s.archivedAt?.toISOString() ?? null,
    createdAt: s.createdAt.toISOString(),
    contacts: contacts.map(toContactView),
  };
}
