import type { Metadata } from "next";
import Link from "next/link";
import { todayUtc } from "@/db/queries/attention";
import { getProjectBudget } from "@/db/queries/decision-budget";
import { getClientHome } from "@/db/queries/homes";
import { listPendingInvitations } from "@/db/queries/invitations";
import { listMyStudioInvitations } from "@/db/queries/studio-invitations";
import { BudgetSummary } from "@/components/decisions/budget-summary";
import { PendingInvitations } from "@/components/invitations/pending-invitations";
import { Badge, Card, EmptyState, Notice, PageHeader } from "@/components/ui";
import { requireRole } from "@/lib/auth/session";
import { describeDue, formatDay } from "@/lib/format";

export const metadata: Metadata = { title: "My project" };

export default async function ClientHome() {
  const actor = await requireRole("client");
  const [{ projects, waiting, boards }, invitations, studioInvitations] = await Promise.all([getClientHome(actor), listPendingInvitations(actor), listMyStudioInvitations(actor)]);
  const budgets = new Map(await Promise.all(projects.map(async (p) => [p.id, await getProjectBudget(p.id)] as const)));
  const today = todayUtc();
  return (
    <div className="space-y-8">
      <PendingInvitations invitations={invitations} studioInvitations={studioInvitations} />
      {projects.map((project) => {
        const mine = waiting.filter((d) => d.projectId === project.id);
        const budget = budgets.get(project.id);
        return (
          <section key={project.id} className="space-y-6" aria-labelledby={`project-${project.id}`}>
            <PageHeader
              eyebrow="Your renovation"
              title={project.name}
              description={`Install planned for ${formatDay(project.installDate)}`}
            />
            <Card title={mine.length ? `Waiting for you (${mine.length})` : "Waiting for you"}>
              {mine.length === 0 ? (
                <EmptyState title="Nothing to decide right now">
                  Your designer will e-mail you when there&apos;s a choice to make.
                </EmptyState>
              ) : (
                <ul className="divide-y divide-line">
                  {mine.map((d) => (
                    <li key={d.id} className="flex flex-col gap-2 py-4 sm:flex-row sm:items-center sm:justify-between">
                      <span>
                        <Link href={`/client/decisions/${d.id}`} className="block text-lg font-medium underline-offset-4 hover:underline">
                          {d.title}
                        </Link>
                        <span className="text-ink-soft">{d.roomName}</span>
                      </span>
                      <Badge tone={d.dueDate < today ? "problem" : d.status === "chosen" ? "info" : "caution"}>
                        {d.status === "chosen" ? "Picked, not yet approved" : "To choose"} · {describeDue(d.dueDate, today)}
                      </Badge>
                    </li>
                  ))}
                </ul>
              )}
            </Card>
            {budget && <BudgetSummary budget={budget} heading="Your running total" />}
            <Card title="Sample boards">
              {boards.filter((b) => b.projectId === project.id).length === 0 ? (
                <p className="text-ink-soft">Your designer hasn&apos;t shared a sample board yet.</p>
              ) : (
                <ul className="divide-y divide-line">
                  {boards
                    .filter((b) => b.projectId === project.id)
                    .map((b) => (
                      <li key={b.id} className="py-3">
                        <Link href={`/client/boards/${b.id}`} className="inline-flex min-h-tap flex-col justify-center underline-offset-4 hover:underline">
                          <span className="font-medium">{b.name}</span>
                          <span className="text-ink-soft">{b.roomName}</span>
                        </Link>
                      </li>
                    ))}
                </ul>
              )}
            </Card>
            <Link href="/client/decisions" className="inline-flex min-h-tap items-center font-medium underline underline-offset-4">
              All decisions, including the approved ones
            </Link>
          </section>
        );
      })}
      <Notice tone="info" title="About colours on screen">
        Colour on a screen or in a photo is not the finish. Approve from physical samples under your room&apos;s own light.
      </Notice>
    </div>
  );
}
