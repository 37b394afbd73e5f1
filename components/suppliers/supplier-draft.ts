import type { SupplierView } from "@/db/queries/supplier-dto";
import type { KeptValues } from "@/lib/actions/result";

export type ContactRow = { key: string; id: string; name: string; email: string; phone: string; role: string; remove: boolean };
export type SupplierDraft = {
  name: string;
  trade: string;
  email: string;
  phone: string;
  accountNumber: string;
  notes: string;
  contacts: ContactRow[];
};

export const companyFields = ["name", "trade", "email", "phone", "accountNumber", "notes"] as const;
export const contactFields = ["name", "role", "email", "phone"] as const;

let spareCount = 0;
/** A blank row for a new contact: left blank, it is ignored when the form is saved. */
export function spareRow(): ContactRow {
  spareCount += 1;
  return { key: `new-${spareCount}`, id: "", name: "", email: "", phone: "", role: "", remove: false };
}

export function emptyDraft(): SupplierDraft {
  return { name: "", trade: "", email: "", phone: "", accountNumber: "", notes: "", contacts: [{ ...spareRow(), key: "new-0" }] };
}

/** The form as it opens for a saved supplier: its contacts, then one spare row to add another. */
export function draftFromSupplier(s: SupplierView): SupplierDraft {
  return {
    name: s.name,
    trade: s.trade,
    email: s.email ?? "",
    phone: s.phone ?? "",
    accountNumber: s.accountNumber ?? "",
    notes: s.notes ?? "",
    contacts: [
      ...s.contacts.map((c) => ({ key: c.id, id: c.id, name: c.name, email: c.email ?? "", phone: c.phone ?? "", role: c.role ?? "", remove: false })),
      { ...spareRow(), key: "new-0" },
    ],
  };
}

/** What a refused save sent back, as the form's draft: every row as it was typed, ticks included. */
export function draftFromKept(kept: KeptValues): SupplierDraft {
  const rows = [...new Set(Object.keys(kept).flatMap((k) => /^contacts\.(\d{1,3})\./.exec(k)?.[1] ?? []))].map(Number).sort((a, b) => a - b);
  const at = (key: string) => kept[key] ?? "";
  return {
    name: at("name"),
    trade: at("trade"),
    email: at("email"),
    phone: at("phone"),
    accountNumber: at("accountNumber"),
    notes: at("notes"),
    contacts: rows.map((n) => ({
      key: at(`contacts.${n}.id`) || `kept-${n}`,
      id: at(`contacts.${n}.id`),
      name: at(`contacts.${n}.name`),
      email: at(`contacts.${n}.email`),
      phone: at(`contacts.${n}.phone`),
      role: at(`contacts.${n}.role`),
      remove: Boolean(kept[`contacts.${n}.remove`]),
    })),
  };
}

/** The form's fields top to bottom, for putting the cursor in the first one to fix. */
export function fieldOrder(draft: SupplierDraft): string[] {
  return [...companyFields, ...draft.contacts.flatMap((_, i) => contactFields.map((f) => `contacts.${i}.${f}`))];
}
