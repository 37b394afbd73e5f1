import Link from "next/link";
import type { FinishSummary } from "@/db/queries/finish-dto";
import { Figure, Money, Swatch, Td, Tr } from "@/components/ui";
import { finishCategoryLabels } from "@/lib/validation/finish";
import { CautionTitles } from "./caution-titles";
import { describeUnit, formatDays, lrvSourceShort, lrvSourceWords } from "./library-words";
import { LrvFlag } from "./lrv-flag";

/** One table row per finish (wide screens). */
export function FinishRows({ items }: { items: FinishSummary[] }) {
  return items.map((f) => (
    <Tr key={f.id} className={f.archived ? "bg-stone-50" : undefined}>
      <Td className="w-[88px] py-2">
        <Swatch hex={f.hex} imageUrl={f.thumbUrl} name={f.name} lrv={f.lrv} size="sm" caption={false} />
      </Td>
      <Td className="min-w-36">
        <Link href={`/studio/library/${f.id}`} className="font-medium text-ink underline-offset-4 hover:underline">
          {f.name}
        </Link>
        {f.archived && <span className="mt-1 block text-sm text-stone-600">Archived</span>}
      </Td>
      <Td>{finishCategoryLabels[f.category]}</Td>
      <Td>{f.supplierName ?? <span className="text-stone-600">None</span>}</Td>
      <Td className="figures whitespace-nowrap">{f.productCode ?? "—"}</Td>
      <Td>{f.surface ?? "—"}</Td>
      <Td numeric>
        <Money cents={f.unitPriceCents} />
        <span className="block text-stone-600">{describeUnit(f.unit)}</span>
      </Td>
      <Td numeric>{formatDays(f.leadTimeDays)}</Td>
      <Td numeric>
        <Figure value={f.lrv} digits={Number.isInteger(f.lrv) ? 0 : 1} />
        <span className="block text-xs text-stone-600">{lrvSourceShort[f.lrvSource]}</span>
        <LrvFlag finish={f} />
      </Td>
      <Td className="min-w-40 text-xs">
        <CautionTitles keys={f.cautions} />
      </Td>
    </Tr>
  ));
}

/** The same finishes as a list of cards, for phones. */
export function FinishCards({ items }: { items: FinishSummary[] }) {
  return (
    <ul className="divide-y divide-line rounded-lg border border-line bg-card">
      {items.map((f) => (
        <li key={f.id} className="flex gap-3 p-3">
          <Swatch hex={f.hex} imageUrl={f.thumbUrl} name={f.name} lrv={f.lrv} size="sm" caption={false} />
          <div className="flex min-w-0 flex-col gap-0.5 text-sm">
            <Link href={`/studio/library/${f.id}`} className="inline-flex min-h-6 text-base font-medium text-ink underline underline-offset-4">
              {f.name}
            </Link>
            <span className="text-ink-soft">
              {finishCategoryLabels[f.category]}
              {f.supplierName ? ` · ${f.supplierName}` : ""}
            </span>
            <span className="figures text-ink-soft">
              {[f.productCode, f.surface].filter(Boolean).join(" · ")}
            </span>
            <span className="figures">
              <Money cents={f.unitPriceCents} /> {describeUnit(f.unit)} · {formatDays(f.leadTimeDays)} · LRV <Figure value={f.lrv} digits={Number.isInteger(f.lrv) ? 0 : 1} /> ({lrvSourceWords[f.lrvSource]})
            </span>
            <LrvFlag finish={f} align="start" />
            {f.archived && <span className="text-stone-600">Archived</span>}
            {f.cautions.length > 0 && (
              <div className="mt-1">
                <CautionTitles keys={f.cautions} />
              </div>
            )}
          </div>
        </li>
      ))}
    </ul>
  );
}
