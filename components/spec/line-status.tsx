import { Badge } from "@/components/ui";
import { lineStatusLabels, lineStatusTones, type LineStatus } from "@/lib/spec/status";
import { formatShortDay as shortDay } from "@/lib/spec/format";

type Order = { orderedOn: string | null; expectedOn: string | null } | null | undefined;

/** Where a line stands with its supplier, in words (colour and shape only support them). */
export function LineStatusBadge({ status, order }: { status: LineStatus; order?: Order }) {
  return (
    <span className="flex flex-col items-start gap-1">
      <Badge tone={lineStatusTones[status]}>{lineStatusLabels[status]}</Badge>
      {order?.orderedOn && <span className="text-sm text-ink-soft">Ordered {shortDay(order.orderedOn)}</span>}
      {order?.expectedOn && <span className="text-sm text-ink-soft">Expected {shortDay(order.expectedOn)}</span>}
    </span>
  );
}

const issueLabels = { new: "New, not issued yet", changed: "Changed, not issued yet" } as const;

/** On the current specification: lines that differ from the latest revision say so. */
export function IssueStateBadge({ state }: { state: "issued" | "changed" | "new" }) {
  if (state === "issued") return null;
  return <Badge tone="info">{issueLabels[state]}</Badge>;
}
