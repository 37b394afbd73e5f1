import type { Metadata } from "next";
import Link from "next/link";
import { todayUtc } from "@/db/queries/attention";
import { listDecisionsForProject } from "@/db/queries/decisions";
import { BudgetSummary } from "@/components/decisions/budget-summary";
import { DecisionStatusBadge } from "@/components/decisions/status-badge";
import { Badge, EmptyState, LinkButton, Money, PageHeader, Table, TBody, Td, Th, THead, Tr } from "@/components/ui";
import { requireRole } from "@/lib/auth/session";
import { compareToAllowance } from "@/lib/decisions/budget";
import { isDueAfterOrderBy } from "@/lib/decisions/order-by";
import { describeDue, formatDay } from "@/lib/format";
import { pageGuard } from "@/lib/page-guard";

export const metadata: Metadata = { title: "Decisions" };

type Props = { params: Promise<{ projectId: string }> };

export default async function ProjectDecisionsPage({ params }: Props) {
  const { projectId } = await params;
  const actor = await requireRole("designer");
  const { project, items, budget } = await pageGuard(listDecisionsForProject(actor, projectId));
  const today = todayUtc();
  const newHref = `/studio/projects/${project.id}/decisions/new`;
  return (
    <div className="space-y-8">
      <PageHeader
        title="Decisions"
        description="What the clients choose, by due date. Each decision is editable until a client approves it; after that it is locked, and changes go through a variation."
        actions={<LinkButton href={newHref}>New decision</LinkButton>}
      />
      {items.length === 0 ? (
        <EmptyState title="No decisions yet" action={<LinkButton href={newHref}>Open the first decision</LinkButton>}>
          A decision gives the clients two to four options to compare on their phone, with prices against the allowance. Each option is made of
          finishes from your library, so add those first if the library is empty.
        </EmptyState>
      ) : (
        <Table caption="Decisions by due date" captionHidden>
          <THead>
            <Tr>
              <Th>Decision</Th>
              <Th>Where it stands</Th>
              <Th>Due</Th>
              <Th>Order by</Th>
              <Th numeric>Allowance</Th>
              <Th numeric>Picked or approved</Th>
            </Tr>
          </THead>
          <TBody>
            {items.map((d) => {
              const late = d.status !== "locked" && isDueAfterOrderBy(d.dueDate, d.orderBy);
              const diff = d.currentOption ? compareToAllowance(d.currentOption.priceCents, d.allowanceCents) : null;
              return (
                <Tr key={d.id}>
                  <Td>
                    <Link href={`/studio/projects/${project.id}/decisions/${d.id}`} className="font-medium underline-offset-4 hover:underline">
                      {d.title}
                    </Link>
                    <div className="text-ink-soft">
                      {d.roomName} · {d.optionCount} options
                    </div>
                  </Td>
                  <Td>
                    <div className="flex flex-col items-start gap-1">
                      <DecisionStatusBadge status={d.status} />
                      {d.openVariation && <Badge tone="caution">{d.openVariation === "requested" ? "Variation to price" : "Variation with the client"}</Badge>}
                    </div>
                  </Td>
                  <Td>
                    <span className="figures">{formatDay(d.dueDate)}</span>
                    {d.status !== "locked" && <div className={d.dueDate < today ? "font-medium text-problem-ink" : "text-ink-soft"}>{describeDue(d.dueDate, today)}</div>}
                  </Td>
                  <Td>
                    {d.orderBy ? <span className="figures">{formatDay(d.orderBy.date)}</span> : <span className="text-ink-soft">set an install date</span>}
                    {late && <div className="font-medium text-caution-ink">Due after the order-by date</div>}
                  </Td>
                  <Td numeric>
                    <Money cents={d.allowanceCents} />
                  </Td>
                  <Td numeric>
                    {d.currentOption && diff ? (
                      <>
                        <Money cents={d.currentOption.priceCents} />
                        <div className="text-ink-soft">
                          <Money cents={diff.differenceCents} signed />
                        </div>
                      </>
                    ) : (
                      <span className="text-ink-soft">—</span>
                    )}
                  </Td>
                </Tr>
              );
            })}
          </TBody>
        </Table>
      )}
      <BudgetSummary budget={budget} heading="Running total against the allowances" />
    </div>
  );
}
