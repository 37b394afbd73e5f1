import type { Metadata } from "next";
import Link from "next/link";
import { getSupplierHome } from "@/db/queries/homes";
import { listPendingInvitations } from "@/db/queries/invitations";
import { listMyStudioInvitations } from "@/db/queries/studio-invitations";
import { PendingInvitations } from "@/components/invitations/pending-invitations";
import { Badge, Card, EmptyState, PageHeader } from "@/components/ui";
import { requireRole } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Issued to me" };

export default async function SupplierHome() {
  const actor = await requireRole("supplier");
  const [revisions, invitations, studioInvitations] = await Promise.all([getSupplierHome(actor), listPendingInvitations(actor), listMyStudioInvitations(actor)]);
  return (
    <div className="space-y-8">
      <PageHeader title="Issued to you" description="Specification revisions with lines for your company, newest first." />
      <PendingInvitations invitations={invitations} studioInvitations={studioInvitations} />
      {revisions.length === 0 ? (
        <EmptyState title="Nothing issued to you yet">
          When a designer issues a specification with lines for you, you&apos;ll get an e-mail and it will appear here.
        </EmptyState>
      ) : (
        <Card>
          <ul className="divide-y divide-line">
            {revisions.map((r) => (
              <li key={r.revisionId} className="flex flex-col gap-2 py-4 sm:flex-row sm:items-center sm:justify-between">
                <span>
                  <Link href={`/supplier/revisions/${r.revisionId}`} className="block text-lg font-medium underline-offset-4 hover:underline">
                    {r.projectName} · Revision {r.letter}
                  </Link>
                  <span className="text-ink-soft tabular-nums">
                    {r.lineCount} {r.lineCount === 1 ? "line" : "lines"} · issued {r.issuedAt.toISOString().slice(0, 10)}
                  </span>
                </span>
                <Badge tone={r.acknowledgedAt ? "ok" : "caution"}>{r.acknowledgedAt ? "Acknowledged" : "Not yet acknowledged"}</Badge>
              </li>
            ))}
          </ul>
        </Card>
      )}
    </div>
  );
}
