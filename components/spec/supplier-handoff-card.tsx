import { Badge, Card, Figure } from "@/components/ui";
import type { SpecDiff } from "@/lib/spec/diff";
import { formatShortDay } from "@/lib/spec/format";
import { DiffList } from "./diff-list";
import { LineStatusBadge } from "./line-status";
import type { HandoffLine } from "@/db/queries/spec-handoff-view";

type Props = {
  latestLetter: string;
  supplier: {
    supplierName: string;
    contacts: { email: string; name: string | null }[];
    lines: HandoffLine[];
    acknowledged: { letter: string; acknowledgedAt: Date; byName: string | null; byEmail: string }[];
    upToDate: boolean;
    changesSinceAck: SpecDiff | null;
    late: HandoffLine[];
    dueSoon: HandoffLine[];
    orderedCount: number;
  };
};

function LineRow({ line }: { line: HandoffLine }) {
  return (
    <li className="flex flex-col gap-1 py-2 sm:flex-row sm:items-start sm:justify-between">
      <span>
        <span className="font-medium">{line.room} · {line.item}</span>
        <span className="block text-ink-soft">Order by {line.orderByDate ? formatShortDay(line.orderByDate) : "not set"}</span>
      </span>
      <LineStatusBadge status={line.status} order={line.order} />
    </li>
  );
}

/** One supplier's side of the hand-off: acknowledgements, what changed for them, and their late lines. */
export function SupplierHandoffCard({ supplier: s, latestLetter }: Props) {
  const last = s.acknowledged.at(-1);
  const badge = s.lines.length === 0
    ? <Badge>No lines in revision {latestLetter}</Badge>
    : s.upToDate
      ? <Badge tone="ok">Acknowledged revision {latestLetter}</Badge>
      : <Badge tone="caution">Hasn&apos;t acknowledged revision {latestLetter}</Badge>;
  return (
    <Card title={s.supplierName} level={3} actions={badge}>
      <div className="flex flex-col gap-4">
        <p className="text-ink-soft">
          {s.contacts.length ? `Contact: ${s.contacts.map((c) => c.name ? `${c.name} (${c.email})` : c.email).join(", ")}` : "No contact on this project, so nobody there is e-mailed. Invite one from the project's overview."}
        </p>
        <p>
          <Figure value={s.lines.length} /> {s.lines.length === 1 ? "line" : "lines"} in revision {latestLetter} · <Figure value={s.orderedCount} /> ordered
          {last ? ` · last acknowledged revision ${last.letter} on ${formatShortDay(last.acknowledgedAt.toISOString().slice(0, 10))} by ${last.byName ?? last.byEmail}` : " · has not acknowledged any revision"}
        </p>
        {s.changesSinceAck && last && (
          <div>
            <h4 className="font-semibold">What changed for them since revision {last.letter}</h4>
            <DiffList diff={s.changesSinceAck} empty={`Nothing of theirs changed since revision ${last.letter}.`} />
          </div>
        )}
        {s.late.length > 0 && (
          <div>
            <h4 className="font-semibold text-problem-ink">Late</h4>
            <ul className="divide-y divide-line">{s.late.map((l) => <LineRow key={l.id} line={l} />)}</ul>
          </div>
        )}
        {s.dueSoon.length > 0 && (
          <div>
            <h4 className="font-semibold">To be ordered within two weeks</h4>
            <ul className="divide-y divide-line">{s.dueSoon.map((l) => <LineRow key={l.id} line={l} />)}</ul>
          </div>
        )}
      </div>
    </Card>
  );
}
