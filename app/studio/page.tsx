import type { Metadata } from "next";
import Link from "next/link";
import { getStudioAttention, todayUtc } from "@/db/queries/attention";
import { listProjectsForActor } from "@/db/queries/projects";
import { listMyStudioInvitations } from "@/db/queries/studio-invitations";
import { StudioAttentionList } from "@/components/attention/studio-attention";
import { PendingInvitations } from "@/components/invitations/pending-invitations";
import { Card, EmptyState, LinkButton, PageHeader } from "@/components/ui";
import { requireRole } from "@/lib/auth/session";
import { formatDay } from "@/lib/format";

export const metadata: Metadata = { title: "Projects" };

export default async function StudioHome() {
  const actor = await requireRole("designer");
  const today = todayUtc();
  const [projects, attention, studioInvitations] = await Promise.all([
    listProjectsForActor(actor),
    getStudioAttention(actor, today),
    listMyStudioInvitations(actor),
  ]);
  return (
    <div className="space-y-8">
      <PageHeader
        eyebrow={actor.studio?.name}
        title="Projects"
        actions={<LinkButton href="/studio/projects/new">New project</LinkButton>}
      />
      <PendingInvitations invitations={[]} studioInvitations={studioInvitations} />
      {projects.length > 0 && (
        <Card title="Needs attention">
          <StudioAttentionList attention={attention} today={today} />
        </Card>
      )}
      {projects.length === 0 ? (
        <EmptyState
          title="Set up your studio"
          action={
            <>
              <LinkButton href="/studio/projects/new">Create your first project</LinkButton>
              <LinkButton href="/studio/library/new" variant="secondary">
                Add finishes to your library
              </LinkButton>
              <LinkButton href="/studio/suppliers" variant="secondary">
                Add your suppliers and trades
              </LinkButton>
            </>
          }
        >
          A project holds the rooms, sample boards, client decisions and specification of one renovation. Add the finishes you use and the
          suppliers and trades you order from, and every project can draw on them.
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
