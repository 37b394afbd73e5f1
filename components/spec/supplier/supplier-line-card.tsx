import { Badge, Figure } from "@/components/ui";
import { formatDay } from "@/lib/format";
import { supersededReason } from "@/lib/spec/line-change";
import { quantityDigits } from "@/lib/spec/group";
import { describeSurfaceFormat, describeWhere } from "@/lib/spec/line-detail";
import type { RevisionJson } from "@/lib/spec/revision-json";
import { LineCautions } from "../line-cautions";
import { LineStatusBadge } from "../line-status";
import { LinePhoto } from "./line-photo";
import { OrderDatesForm } from "./order-dates-form";

type Line = RevisionJson["lines"][number];

/** One line for a supplier, as a card: what, where, which finish (surface, format, photo), how many, by when, and their order dates. */
type Props = { revisionId: string; letter: string; line: Line; canRecord: boolean; whyNot: string; change: { kind: "added" | "changed"; since: string } | null };

const day = (iso: string | null) => (iso ? formatDay(iso.slice(0, 10)) : null);

export function SupplierLineCard({ revisionId, letter, line, canRecord, whyNot, change }: Props) {
  const surfaceFormat = describeSurfaceFormat(line);
  // An approved variation overtook this line after it was issued: say so on the line, and take the order fields away.
  const overtaken = line.change?.state === "superseded" ? line.change : null;
  const stands = line.change?.state === "confirmed" ? line.change : null;
  return (
    <li
      className="flex flex-col gap-3 rounded-lg border border-line bg-card p-4 shadow-card"
      data-late={line.status === "order-overdue" || line.status === "arrives-late" || undefined}
      data-superseded={overtaken ? true : undefined}
    >
      <div className="flex items-start justify-between gap-3">
        <div className="flex flex-col items-start gap-0.5">
          {overtaken && <Badge tone="caution">Changed: a new revision is coming</Badge>}
          {change && <Badge tone={change.kind === "added" ? "ok" : "caution"}>{change.kind === "added" ? "New" : "Changed"} since revision {change.since}</Badge>}
          <h3 className="text-lg font-semibold">{line.item}</h3>
          <p className="text-ink-soft">{describeWhere(line)}</p>
        </div>
        {line.photo && <LinePhoto photo={line.photo} finishName={line.finishName} />}
      </div>
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
        <dt className="text-ink-soft">Finish</dt>
        <dd>{line.finishName}</dd>
        <dt className="text-ink-soft">Surface, format</dt>
        <dd>{surfaceFormat ?? "not given"}</dd>
        <dt className="text-ink-soft">Product code</dt>
        <dd className="figures">{line.productCode ?? "none given"}</dd>
        <dt className="text-ink-soft">Quantity</dt>
        <dd>
          <Figure value={line.quantity} digits={quantityDigits(line.quantity)} unit={line.unit} />
        </dd>
        <dt className="text-ink-soft">Lead time</dt>
        <dd>
          <Figure value={line.leadTimeDays} unit="days" />
        </dd>
        <dt className="text-ink-soft">Order by</dt>
        <dd className="font-medium">{line.orderByDate ? formatDay(line.orderByDate) : "not set yet"}</dd>
      </dl>
      <LineCautions keys={line.cautions} />
      <LineStatusBadge status={line.status} order={line.order} />
      {overtaken && (
        <p className="rounded-md border border-caution/50 bg-caution-wash px-3 py-2" role="note" data-testid="superseded-note">
          {supersededReason(letter, overtaken, day(overtaken.variedAt))} Don&apos;t order this line as issued.
        </p>
      )}
      {stands && (
        <p className="rounded-md bg-ok-wash px-3 py-2" role="note" data-testid="confirmed-note">
          A variation changed “{stands.decisionTitle}” after revision {letter} was issued; on {day(stands.confirmedAt)} {stands.confirmedBy ?? "the studio"} confirmed this
          line stands as issued{stands.note ? `: “${stands.note}”` : "."} You may order it.
        </p>
      )}
      <div className="border-t border-line pt-3">
        {overtaken ? (
          <p className="text-ink-soft">Order dates open again when the new revision is issued, or when the studio confirms this line stands.</p>
        ) : canRecord ? (
          <OrderDatesForm revisionId={revisionId} lineId={line.id} item={line.item} orderedOn={line.order?.orderedOn ?? null} expectedOn={line.order?.expectedOn ?? null} />
        ) : (
          <p className="text-ink-soft">{whyNot}</p>
        )}
      </div>
    </li>
  );
}
