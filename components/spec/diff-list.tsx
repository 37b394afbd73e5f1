import { Badge } from "@/components/ui";
import { cautionTitles } from "@/lib/spec/caution-notes";
import { fieldLabels, visibleChanges, type FieldChange, type SpecDiff } from "@/lib/spec/diff";
import { formatDay } from "@/lib/format";
import type { SpecLineContent } from "@/lib/spec/types";

function show(change: FieldChange, value: FieldChange["before"], unit: string): string {
  if (value === null || value === "") return "none";
  if (Array.isArray(value)) return value.length ? cautionTitles(value).join("; ") : "none";
  if (change.field === "orderByDate" && typeof value === "string") return formatDay(value);
  if (change.field === "leadTimeDays") return `${String(value)} days`;
  if (change.field === "quantity") return `${String(value)} ${unit}`;
  return String(value);
}

function name(line: SpecLineContent) {
  return `${line.room} · ${line.item}${line.location && line.location !== line.room ? ` (${line.location})` : ""}`;
}

/** What changed between two revisions, line by line: added, removed, and each changed field. */
export function DiffList({ diff, empty }: { diff: SpecDiff; empty: string }) {
  const total = diff.added.length + diff.removed.length + diff.changed.length;
  if (total === 0) return <p className="text-ink-soft">{empty}</p>;
  return (
    <ul className="flex flex-col divide-y divide-line" aria-label="Changes">
      {diff.added.map((l) => (
        <li key={`a-${l.lineKey}`} className="flex flex-col items-start gap-1 py-3 sm:flex-row sm:gap-3">
          <Badge tone="ok">Added</Badge>
          <span>
            <span className="font-medium">{name(l)}</span>: {l.finishName}
            {l.productCode ? ` (${l.productCode})` : ""}, {l.quantity} {l.unit}
          </span>
        </li>
      ))}
      {diff.removed.map((l) => (
        <li key={`r-${l.lineKey}`} className="flex flex-col items-start gap-1 py-3 sm:flex-row sm:gap-3">
          <Badge tone="problem">Removed</Badge>
          <span>
            <span className="font-medium">{name(l)}</span>: {l.finishName}
            {l.productCode ? ` (${l.productCode})` : ""}, {l.quantity} {l.unit}
          </span>
        </li>
      ))}
      {diff.changed.map((c) => (
        <li key={`c-${c.lineKey}`} className="flex flex-col items-start gap-1 py-3 sm:flex-row sm:gap-3">
          <Badge tone="caution">Changed</Badge>
          <div className="min-w-0">
            <p className="font-medium">{name(c.after)}</p>
            <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 text-sm">
              {visibleChanges(c.changes).map((f) => (
                <div key={f.field} className="contents">
                  <dt className="text-ink-soft">{fieldLabels[f.field]}</dt>
                  <dd>
                    <del className="text-ink-soft">{show(f, f.before, c.before.unit)}</del> <span aria-hidden="true">→</span>
                    <span className="sr-only">now</span> <ins className="font-medium no-underline">{show(f, f.after, c.after.unit)}</ins>
                  </dd>
                </div>
              ))}
            </dl>
          </div>
        </li>
      ))}
    </ul>
  );
}
