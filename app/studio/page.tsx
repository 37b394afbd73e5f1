import type { Metadata } from "next";
import Link from "next/link";
import { listDecisionsNeedingAttention, todayUtc } from "@/db/queries/attention";
import { listProjectsForActor } from "@/db/queries/projects";
import { Badge, Card, EmptyState, LinkButton, PageHeader } from "@/components/ui";
import { requireRole } from "@/lib/auth/session";
import { describeDue, formatDay } from "@/lib/format";

export const metadata: Metadata = { title: "Projects" };

export default async function StudioHome() {
  const actor = await requireRole("designer");
  const today = todayUtc();
  const [projects, attention] = await Promise.all([
    listProjectsForActor(actor),
    listDecisionsNeedingAttention(actor.studio?.id ?? "", today),
  ]);
  return (
    <div className="space-y-8">
      <PageHeader
        eyebrow={actor.studio?.name}
        title="Projects"
        actions={<LinkButton href="/studio/projects/new">New project</LinkButton>}
      />
      <Card title="Needs attention">
        {attention.length === 0 ? (
          <p className="text-ink-soft">Nothing is due in the next three weeks. Decisions waiting on clients will show here.</p>
        ) : (
          <ul className="divide-y divide-line">
            {attention.map((d) => (
              <li key={d.id} className="flex flex-wrap items-center justify-between gap-2 py-3">
                <span>
                  <Link className="font-medium underline-offset-4 hover:underline" href={`/studio/projects/${d.projectId}`}>
                    {d.title}
                  </Link>
                  <span className="text-ink-soft"> · {d.roomName} · {d.projectName}</span>
                </span>
                <Badge tone={d.dueDate < today ? "problem" : "caution"}>
                  {describeDue(d.dueDate, today)} ({formatDay(d.dueDate)})
                </Badge>
              </li>
            ))}
          </ul>
        )}
      </Card>
      {projects.length === 0 ? (
        <EmptyState title="No projects yet" action={<LinkButton href="/studio/projects/new">Create your first project</LinkButton>}>
          A project holds the rooms, sample boards, client decisions and specification of one renovation.
        </EmptyState>
      ) : (
        <ul className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
          {projects.map((p) => (
            <li key={p.id}>
              <Link
                href={`/studio/projects/${p.id}`}
                className="block h-full rounded-lg border border-line bg-card p-5 hover:border-ink-soft"
              >
                <h2 className="font-display text-xl">{p.name}</h2>
                {p.siteAddress ? <p className="text-ink-soft">{p.siteAddress}</p> : null}
                <dl className="mt-4 grid grid-cols-2 gap-2 text-sm">
                  <dt className="text-ink-soft">Install</dt>
                  <dd className="tabular-nums">{formatDay(p.installDate)}</dd>
                  <dt className="text-ink-soft">Open decisions</dt>
                  <dd className="tabular-nums">{p.openDecisions}</dd>
                </dl>
              </Link>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
