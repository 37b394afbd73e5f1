import { Badge } from "@/components/ui";
import { formatDay } from "@/lib/format";
import type { LineChange } from "@/lib/spec/line-change";
import { ConfirmLineForm } from "./confirm-line-form";

export type ChangedLine = { id: string; item: string; room: string; location: string | null; finishName: string; supplierName: string | null; change: LineChange };

type Props = { revisionId: string; letter: string; lines: ChangedLine[]; canConfirm: boolean };

const day = (iso: string | null) => (iso ? formatDay(iso.slice(0, 10)) : null);

/**
 * Issued lines an approved variation has overtaken: their suppliers can't record an order until
 * the next revision is issued or the designer says the issued line stands (here).
 */
export function ChangedLines({ revisionId, letter, lines, canConfirm }: Props) {
  return (
    <ul className="flex flex-col gap-4" data-testid="changed-lines">
      {lines.map((line) => {
        const { change } = line;
        return (
          <li key={line.id} className="flex flex-col gap-2 rounded-lg border border-line bg-card p-4" data-state={change.state}>
            <div className="flex flex-wrap items-center gap-2">
              {change.state === "superseded" ? <Badge tone="caution">Changed since issued</Badge> : <Badge tone="ok">Stands as issued</Badge>}
              <span className="font-medium">{line.item}</span>
              <span className="text-ink-soft">
                {[line.room, line.location].filter(Boolean).join(" · ")} · {line.finishName}
                {line.supplierName ? ` · ${line.supplierName}` : ""}
              </span>
            </div>
            <p className="text-ink-soft">
              A variation to “{change.decisionTitle}” was approved{change.variedAt ? ` on ${day(change.variedAt)}` : ""}, after revision {letter} was issued.
            </p>
            {change.state === "superseded" ? (
              <>
                <p>
                  The supplier sees that this line has changed and can&apos;t record an order on it. Issue a new revision, or, if the issued line is still
                  right, confirm it stands.
                </p>
                {canConfirm && <ConfirmLineForm revisionId={revisionId} lineId={line.id} letter={letter} item={line.item} />}
              </>
            ) : (
              <p>
                {change.confirmedBy ?? "The studio"} confirmed on {day(change.confirmedAt)} that the issued line stands{change.note ? `: “${change.note}”` : "."} The supplier
                may order it.
              </p>
            )}
          </li>
        );
      })}
    </ul>
  );
}
