import type { Metadata } from "next";
import { CsvImport } from "@/components/library/csv-import";
import { buttonClasses, Card, PageHeader } from "@/components/ui";
import { requireRole } from "@/lib/auth/session";
import { cautionKeys } from "@/lib/cautions";
import { finishCategoryKeys } from "@/lib/validation/finish";
import { csvColumns } from "@/lib/validation/finish-csv";

export const metadata: Metadata = { title: "Import or export the library" };

const columnNotes: Record<(typeof csvColumns)[number], string> = {
  name: "Required.",
  category: `Required: ${finishCategoryKeys.join(", ")} (or the category's name as the library shows it).`,
  supplier: "One of your studio's suppliers, by name; blank for none. A name you don't have yet can be added here after checking the file.",
  product_code: "The maker's code. A code already in the library from the same supplier is refused.",
  finish: "Polished, honed, matt…",
  format: "Size or format.",
  unit: "Required: what the price is per (m², each, L…).",
  unit_price: "Required, in dollars: 680 or $1,234.50.",
  lead_time_days: "Required, whole days.",
  colour: "The maker's colour: #d9d2c3, rgb(…) or lab(L a b). Blank if only the LRV is known.",
  lrv: "The maker's published LRV, 0–100. Blank to compute it from the colour.",
  cautions: `Separated by semicolons, by name or key: ${cautionKeys.join(", ")}.`,
  care_notes: "Free text.",
};

export default async function LibraryImportPage() {
  await requireRole("designer");
  return (
    <div className="space-y-6">
      <PageHeader eyebrow="Library" title="Import or export" description="Bring in the spreadsheet you already keep, or take the library out as one." />
      <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <Card title="Import finishes">
          <CsvImport />
        </Card>
        <div className="flex flex-col gap-6">
          <Card title="Export">
            <p className="mb-4 text-ink-soft">Every finish, archived ones included, in the columns the import reads, plus hex, LRV used and its source.</p>
            <a href="/api/finishes/export" download className={buttonClasses("secondary")}>
              Download the library as CSV
            </a>
          </Card>
          <Card title="Columns">
            <dl className="flex flex-col gap-2 text-sm">
              {csvColumns.map((c) => (
                <div key={c}>
                  <dt className="figures font-semibold text-ink">{c}</dt>
                  <dd className="text-ink-soft">{columnNotes[c]}</dd>
                </div>
              ))}
            </dl>
            <p className="mt-3 text-sm text-stone-600">Headers are matched loosely: “Unit price”, “Price” and “unit_price” all work.</p>
          </Card>
        </div>
      </div>
    </div>
  );
}
