import { Badge, Figure } from "@/components/ui";
import { formatDay } from "@/lib/format";

type Supplier = { supplierId: string; supplierName: string; lineCount: number };
type Ack = { supplierId: string; acknowledgedAt: Date; byName: string | null; byEmail: string };

/** Each supplier on a revision: their lines, whether they acknowledged it, and their own CSV. */
export function RevisionSuppliers({ revisionId, suppliers, acknowledgements }: { revisionId: string; suppliers: Supplier[]; acknowledgements: Ack[] }) {
  return (
    <ul className="divide-y divide-line">
      {suppliers.map((s) => {
        const ack = acknowledgements.find((a) => a.supplierId === s.supplierId);
        return (
          <li key={s.supplierId} className="flex flex-col gap-2 py-3 sm:flex-row sm:items-center sm:justify-between">
            <span>
              <span className="font-medium">{s.supplierName}</span>
              <span className="block text-ink-soft">
                <Figure value={s.lineCount} /> {s.lineCount === 1 ? "line" : "lines"}
                {ack ? ` · acknowledged ${formatDay(ack.acknowledgedAt.toISOString().slice(0, 10))} by ${ack.byName ?? ack.byEmail}` : ""}
              </span>
            </span>
            <span className="flex flex-wrap items-center gap-3">
              {ack ? <Badge tone="ok">Acknowledged</Badge> : <Badge tone="caution">Not acknowledged yet</Badge>}
              <a
                href={`/api/revisions/${revisionId}/export.csv?supplier=${encodeURIComponent(s.supplierId)}`}
                className="inline-flex min-h-tap items-center text-spruce underline underline-offset-4"
                download
              >
                CSV<span className="sr-only"> of {s.supplierName}&apos;s lines</span>
              </a>
            </span>
          </li>
        );
      })}
    </ul>
  );
}
