import type { Metadata } from "next";
import Link from "next/link";
import { todayUtc } from "@/db/queries/attention";
import { listDecisionsForProject } from "@/db/queries/decisions";
import { BudgetSummary } from "@/components/decisions/budget-summary";
import { DecisionStatusBadge } from "@/components/decisions/status-badge";
import { Badge, Card, Money, PageHeader } from "@/components/ui";
import { requireRole } from "@/lib/auth/session";
import { clientProjectIds } from "@/lib/auth/permissions";
import { describeDue, formatDay } from "@/lib/format";

export const metadata: Metadata = { title: "Decisions" };

/** Every decision of the client's projects: the open ones by due date, then the approved ones. */
export default async function ClientDecisionsPage() {
  const actor = await requireRole("client");
  const today = todayUtc();
  const projects = await Promise.all(clientProjectIds(actor).map((id) => listDecisionsForProject(actor, id)));
  return (
    <div className="space-y-8">
      {projects.map(({ project, items, budget }) => {
        const open = items.filter((d) => d.status !== "locked");
        const done = items.filter((d) => d.status === "locked");
        return (
          <section key={project.id} className="space-y-6" aria-labelledby={`decisions-${project.id}`}>
            <PageHeader eyebrow={project.name} title={<span id={`decisions-${project.id}`}>Decisions</span>} />
            <Card title={`To decide (${open.length})`}>
              {open.length === 0 ? (
                <p className="text-ink-soft">Nothing waiting for you.</p>
              ) : (
                <ul className="divide-y divide-line">
                  {open.map((d) => (
                    <li key={d.id} className="py-3">
                      <Link href={`/client/decisions/${d.id}`} className="flex min-h-tap flex-col gap-1 underline-offset-4 hover:underline">
                        <span className="text-lg font-medium">{d.title}</span>
                        <span className="text-ink-soft">
                          {d.roomName} · by {formatDay(d.dueDate)} · allowance <Money cents={d.allowanceCents} />
                        </span>
                      </Link>
                      <div className="mt-1 flex flex-wrap gap-2">
                        <DecisionStatusBadge status={d.status} forClient />
                        <Badge tone={d.dueDate < today ? "problem" : "neutral"}>{describeDue(d.dueDate, today)}</Badge>
                      </div>
                    </li>
                  ))}
                </ul>
              )}
            </Card>
            {done.length > 0 && (
              <Card title={`Approved (${done.length})`}>
                <ul className="divide-y divide-line">
                  {done.map((d) => (
                    <li key={d.id} className="py-3">
                      <Link href={`/client/decisions/${d.id}`} className="flex min-h-tap flex-col gap-1 underline-offset-4 hover:underline">
                        <span className="font-medium">{d.title}</span>
                        <span className="text-ink-soft">
                          {d.currentOption?.label} · approved by {d.approvedBy ?? "a client"}
                          {d.openVariation ? " · a change is under way" : ""}
                        </span>
                      </Link>
                    </li>
                  ))}
                </ul>
              </Card>
            )}
            <BudgetSummary budget={budget} heading="Your project's running total" />
          </section>
        );
      })}
    </div>
  );
}
