import type { ReactNode } from "react";
import { GUIDANCE_ONLY } from "@/lib/cautions";
import { formatDay } from "@/lib/format";
import { cautionNotes, cautionsAcross } from "@/lib/spec/caution-notes";
import { formatShortDay } from "@/lib/spec/format";
import { groupByRoom, quantityDigits } from "@/lib/spec/group";
import type { SpecLineContent } from "@/lib/spec/types";
import { formatFigure } from "@/components/ui";

type Pending = { id: string; title: string; room: string; dueDate: string };

type Props = {
  heading: string;
  /** Lines of facts under the heading: project, issue, install date… */
  facts: { label: string; value: ReactNode }[];
  lines: SpecLineContent[];
  pending?: Pending[];
  draft: boolean;
};

/**
 * The specification laid out for paper: compact tables by room, each line's cautions under it
 * and their full texts at the end, so the printed sheet carries the warnings with the order.
 */
export function PrintSheet({ heading, facts, lines, pending = [], draft }: Props) {
  const notes = cautionsAcross(lines);
  const numbers = new Map(notes.map((n, i) => [n.key, i + 1]));
  return (
    <article className="print-sheet mx-auto flex max-w-[190mm] flex-col gap-5 bg-card p-6 text-[10pt] leading-snug shadow-card print:max-w-none print:p-0">
      <header className="flex flex-col gap-2 border-b-2 border-ink pb-3">
        <h1 className="font-display text-[20pt] font-semibold leading-tight">{heading}</h1>
        {draft && <p className="font-semibold">Working draft: not an issued revision. Do not order from this copy.</p>}
        <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-0.5">
          {facts.map((f) => (
            <div key={f.label} className="contents">
              <dt className="text-ink-soft">{f.label}</dt>
              <dd className="min-w-0 break-words">{f.value}</dd>
            </div>
          ))}
        </dl>
      </header>
      {groupByRoom(lines).map((group) => (
        <section key={group.key} className="flex flex-col gap-1.5">
          <h2 className="text-[13pt] font-semibold">{group.title}</h2>
          <table className="print-table w-full border-collapse text-left">
            <thead>
              <tr className="border-b border-ink">
                <th className="w-[30%] py-1 pr-2">Item</th>
                <th className="w-[24%] py-1 pr-2">Finish</th>
                <th className="w-[17%] py-1 pr-2">Supplier</th>
                <th className="py-1 pr-2 text-right">Qty</th>
                <th className="py-1 pr-2 text-right">Lead</th>
                <th className="py-1 text-right">Order by</th>
              </tr>
            </thead>
            <tbody>
              {group.lines.map((l) => (
                <tr key={l.lineKey} className="border-b border-stone-300 align-top">
                  <td className="py-1 pr-2">
                    <span className="font-semibold">{l.item}</span>
                    {l.location && <span className="block">{l.location}</span>}
                    {cautionNotes(l.cautions).map((c) => (
                      <span key={c.key} className="block text-[8.5pt]">
                        ⚠ {c.title} (note {numbers.get(c.key)})
                      </span>
                    ))}
                  </td>
                  <td className="py-1 pr-2">
                    {l.finishName}
                    {l.productCode && <span className="figures block">{l.productCode}</span>}
                  </td>
                  <td className="py-1 pr-2">{l.supplierName ?? "—"}</td>
                  <td className="figures whitespace-nowrap py-1 pr-2 text-right">
                    {formatFigure(l.quantity, quantityDigits(l.quantity))}&#8239;{l.unit}
                  </td>
                  <td className="figures whitespace-nowrap py-1 pr-2 text-right">{l.leadTimeDays}&#8239;d</td>
                  <td className="figures whitespace-nowrap py-1 text-right">{l.orderByDate ? formatShortDay(l.orderByDate) : "—"}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </section>
      ))}
      {pending.length > 0 && (
        <section className="flex flex-col gap-1.5">
          <h2 className="text-[13pt] font-semibold">Not decided yet (not part of this specification)</h2>
          <ul className="list-disc pl-5">
            {pending.map((p) => (
              <li key={p.id}>
                {p.room} · {p.title}: the client&apos;s choice is due {formatDay(p.dueDate)}
              </li>
            ))}
          </ul>
        </section>
      )}
      {notes.length > 0 && (
        <section className="print-notes flex flex-col gap-1.5">
          <h2 className="text-[13pt] font-semibold">Cautions</h2>
          <ol className="flex flex-col gap-1 pl-5 [list-style:decimal]">
            {notes.map((c) => (
              <li key={c.key}>
                <span className="font-semibold">{c.title}.</span> {c.text}
              </li>
            ))}
          </ol>
          <p className="font-semibold">{GUIDANCE_ONLY}</p>
        </section>
      )}
      <footer className="border-t border-ink pt-2 text-[8.5pt] text-ink-soft">
        Quantities are as specified; confirm on site before ordering. Lead times are the supplier&apos;s; order-by dates are the install date minus the lead time.
      </footer>
    </article>
  );
}
