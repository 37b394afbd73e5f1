import type { ReactNode } from "react";
import { Badge, cx, Figure, Table, TBody, Td, Th, THead, Tr } from "@/components/ui";
import { formatDay } from "@/lib/format";
import { quantityDigits } from "@/lib/spec/group";
import { isLate, type LineStatus } from "@/lib/spec/status";
import type { SpecLineContent } from "@/lib/spec/types";
import { LineCautions } from "./line-cautions";
import { IssueStateBadge, LineStatusBadge } from "./line-status";

export type TableLine = SpecLineContent & {
  id?: string;
  status?: LineStatus;
  order?: { orderedOn: string | null; expectedOn: string | null } | null;
  issueState?: "issued" | "changed" | "new";
  variationPending?: boolean;
};

export type PendingRow = { id: string; title: string; dueDate: string; status: string; room?: string };

type Props = {
  caption: ReactNode;
  lines: TableLine[];
  pending?: PendingRow[];
  showSupplier?: boolean;
  /** Grouped by supplier, each line says which room it is for. */
  showRoom?: boolean;
  showStatus?: boolean;
  cautionNumbers?: Map<string, number>;
};

/**
 * One group of a specification (a room or a supplier) as a schedule. Late lines and decisions
 * still open stand out with a tinted row and words that say why.
 */
export function SpecLinesTable({ caption, lines, pending = [], showSupplier = true, showRoom = false, showStatus = true, cautionNumbers }: Props) {
  const columns = 5 + (showSupplier ? 1 : 0) + (showStatus ? 1 : 0);
  return (
    <Table caption={caption} captionHidden className="spec-table">
      <THead>
        <tr>
          <Th className="min-w-48">Item</Th>
          <Th className="min-w-40">Finish</Th>
          {showSupplier && <Th>Supplier</Th>}
          <Th numeric>Quantity</Th>
          <Th numeric>Lead time</Th>
          <Th>Order by</Th>
          {showStatus && <Th>Status</Th>}
        </tr>
      </THead>
      <TBody>
        {lines.map((line) => {
          const late = line.status !== undefined && isLate(line.status);
          return (
            <Tr key={line.lineKey} className={cx(late && "bg-problem-wash")} data-late={late || undefined}>
              <Td>
                <span className="font-medium">{line.item}</span>
                {(showRoom || line.location) && (
                  <span className="block text-ink-soft">{[...new Set([showRoom ? line.room : null, line.location])].filter(Boolean).join(" · ")}</span>
                )}
                <LineCautions keys={line.cautions} numbers={cautionNumbers} />
              </Td>
              <Td>
                {line.finishName}
                {line.productCode && <span className="figures block text-ink-soft">{line.productCode}</span>}
              </Td>
              {showSupplier && <Td>{line.supplierName ?? <span className="text-ink-soft">No supplier named</span>}</Td>}
              <Td numeric>
                <Figure value={line.quantity} digits={quantityDigits(line.quantity)} unit={line.unit} />
              </Td>
              <Td numeric>
                <Figure value={line.leadTimeDays} unit={line.leadTimeDays === 1 ? "day" : "days"} />
              </Td>
              <Td className="whitespace-nowrap">{line.orderByDate ? formatDay(line.orderByDate) : <span className="text-ink-soft">Set an install date</span>}</Td>
              {showStatus && (
                <Td>
                  <span className="flex flex-col items-start gap-1">
                    {line.issueState && <IssueStateBadge state={line.issueState} />}
                    {line.status && <LineStatusBadge status={line.status} order={line.order} />}
                    {line.variationPending && <Badge tone="caution">Variation under way</Badge>}
                  </span>
                </Td>
              )}
            </Tr>
          );
        })}
        {pending.map((p) => (
          <Tr key={p.id} className="bg-caution-wash" data-pending>
            <Td>
              <span className="font-medium">{p.title}</span>
              <span className="block text-ink-soft">
                {showRoom && p.room ? `${p.room} · ` : ""}Due {formatDay(p.dueDate)}
              </span>
            </Td>
            <Td colSpan={columns - 1}>
              <Badge tone="caution">{p.status === "chosen" ? "Chosen, not approved yet" : "Waiting for the client's choice"}</Badge>
              <span className="mt-1 block text-ink-soft">Not in the specification until the client approves it; never issued while open.</span>
            </Td>
          </Tr>
        ))}
      </TBody>
    </Table>
  );
}
