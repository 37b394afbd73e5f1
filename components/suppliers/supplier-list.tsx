import Link from "next/link";
import type { SupplierView } from "@/db/queries/supplier-dto";
import { Badge } from "@/components/ui";
import { tradeLabel } from "@/lib/suppliers/trades";

const contactsText = (n: number) => (n === 0 ? "No contacts yet" : n === 1 ? "1 contact" : `${n} contacts`);

/** The directory, one row per company: name, trade, contacts and how to reach it. Each row opens it. */
export function SupplierList({ suppliers }: { suppliers: SupplierView[] }) {
  return (
    <ul className="flex flex-col divide-y divide-line rounded-lg border border-line bg-card shadow-card" aria-label="Suppliers and trades">
      {suppliers.map((s) => (
        <li key={s.id}>
          <Link
            href={`/studio/suppliers/${s.id}`}
            className="flex min-h-tap flex-col gap-1 px-4 py-3 hover:bg-stone-50 focus-visible:bg-stone-50 sm:flex-row sm:items-center sm:gap-4 sm:px-5"
          >
            <span className="flex min-w-0 flex-1 flex-wrap items-center gap-2">
              <span className="font-semibold text-ink underline-offset-4 [a:hover_&]:underline">{s.name}</span>
              {s.archived && <Badge tone="neutral">Archived</Badge>}
            </span>
            {/* One line on a phone ("Tiler · 2 contacts"); columns from the sm breakpoint up. */}
            <span className="flex flex-wrap gap-x-2 text-ink-soft sm:contents">
              <span className="sm:w-44">{tradeLabel(s.trade)}</span>
              <span aria-hidden="true" className="sm:hidden">
                ·
              </span>
              <span className="figures sm:w-32">{contactsText(s.contacts.length)}</span>
            </span>
            <span className="min-w-0 break-words text-sm text-stone-600 sm:w-56 sm:text-right">{s.phone ?? s.email ?? ""}</span>
          </Link>
        </li>
      ))}
    </ul>
  );
}
