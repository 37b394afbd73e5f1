import type { Metadata } from "next";
import { getHandoffView } from "@/db/queries/spec-handoff-view";
import { AckMatrix } from "@/components/spec/ack-matrix";
import { LineStatusBadge } from "@/components/spec/line-status";
import { SupplierHandoffCard } from "@/components/spec/supplier-handoff-card";
import { Card, EmptyState, LinkButton, PageHeader, Section } from "@/components/ui";
import { requireRole } from "@/lib/auth/session";
import { pageGuard } from "@/lib/page-guard";
import { formatShortDay } from "@/lib/spec/format";

export const metadata: Metadata = { title: "Supplier hand-off" };

type Props = { params: Promise<{ projectId: string }> };

export default async function HandoffPage({ params }: Props) {
  const { projectId } = await params;
  const actor = await requireRole("designer");
  const view = await pageGuard(getHandoffView(actor, projectId));
  const specHref = `/studio/projects/${view.project.id}/specification`;
  return (
    <div className="flex flex-col gap-8">
      <PageHeader
        title="Supplier hand-off"
        description="Which supplier acknowledged which revision, what is late against its order-by date, and what changed for each supplier since they last acknowledged."
        actions={view.latest ? <LinkButton href={`${specHref}/revisions/${view.latest.id}`} variant="secondary">Open revision {view.latest.letter}</LinkButton> : null}
      />
      {!view.latest ? (
        <EmptyState
          title="Nothing issued yet"
          action={
            <>
              <LinkButton href={specHref}>Go to the specification</LinkButton>
              <LinkButton href="/studio/suppliers" variant="secondary">
                Add the suppliers and trades you order from
              </LinkButton>
            </>
          }
        >
          Suppliers are handed their lines when you issue a revision of the specification. Give each supplier a contact on this project so the
          revision reaches them.
        </EmptyState>
      ) : (
        <>
          <Card title={view.late.length ? `Late: ${view.late.length} ${view.late.length === 1 ? "line" : "lines"}` : "Nothing late"}>
            {view.late.length ? (
              <ul className="divide-y divide-line">
                {view.late.map((l) => (
                  <li key={l.id} className="flex flex-col gap-1 py-3 sm:flex-row sm:items-start sm:justify-between">
                    <span>
                      <span className="font-medium">{l.room} · {l.item}</span>
                      <span className="block text-ink-soft">{l.supplierName} · order by {l.orderByDate ? formatShortDay(l.orderByDate) : "not set"}</span>
                    </span>
                    <LineStatusBadge status={l.status} order={l.order} />
                  </li>
                ))}
              </ul>
            ) : (
              <p className="text-ink-soft">Every line of revision {view.latest.letter} is ordered in time or still before its order-by date.</p>
            )}
          </Card>
          <Section title="Acknowledgements">
            <AckMatrix revisions={view.revisions} suppliers={view.suppliers} />
          </Section>
          <Section title="By supplier">
            <div className="grid items-start gap-6 lg:grid-cols-2">
              {view.suppliers.map((s) => (
                <SupplierHandoffCard key={s.supplierId} supplier={s} latestLetter={view.latest?.letter ?? ""} />
              ))}
            </div>
          </Section>
        </>
      )}
    </div>
  );
}
