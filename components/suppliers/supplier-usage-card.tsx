import Link from "next/link";
import type { SupplierUsage } from "@/db/queries/supplier-dto";
import { Card, Figure } from "@/components/ui";

type Props = { supplierId: string; usage: SupplierUsage };

/** What names this supplier: library finishes, issued specification lines, people on projects. */
export function SupplierUsageCard({ supplierId, usage }: Props) {
  const rows = [
    { label: "Finishes in the library", n: usage.finishes, href: `/studio/library?supplier=${encodeURIComponent(supplierId)}&status=all` },
    { label: "Lines in issued specifications", n: usage.specLines },
    { label: "Contacts on projects", n: usage.projectContacts },
    { label: "Invitations waiting", n: usage.invitations },
  ];
  return (
    <Card title="Where it's used" level={2}>
      <dl className="flex flex-col divide-y divide-line">
        {rows.map((r) => (
          <div key={r.label} className="flex min-h-tap items-center justify-between gap-3 py-1">
            <dt className="text-ink-soft">
              {r.href && r.n > 0 ? (
                <Link href={r.href} className="inline-flex min-h-tap items-center text-ink underline underline-offset-4">
                  {r.label}
                </Link>
              ) : (
                r.label
              )}
            </dt>
            <dd>
              <Figure value={r.n} />
            </dd>
          </div>
        ))}
      </dl>
    </Card>
  );
}
