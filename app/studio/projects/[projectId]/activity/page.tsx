import type { Metadata } from "next";
import { listAuditForProject } from "@/db/queries/audit";
import { getProjectForStaff } from "@/db/queries/projects";
import { When } from "@/components/decisions/when";
import { EmptyState, PageHeader } from "@/components/ui";
import { requireRole } from "@/lib/auth/session";
import { describeAudit } from "@/lib/decisions/audit-words";
import { pageGuard } from "@/lib/page-guard";

export const metadata: Metadata = { title: "Activity" };

type Props = { params: Promise<{ projectId: string }> };

/** The project's audit log: everything anyone did, newest first. Studio staff only. */
export default async function ProjectActivityPage({ params }: Props) {
  const { projectId } = await params;
  const actor = await requireRole("designer");
  const project = await pageGuard(getProjectForStaff(actor, projectId));
  const entries = await listAuditForProject(project.studioId, project.id, 300);
  return (
    <div className="space-y-8">
      <PageHeader title="Activity" description="Everything done on this project, newest first. Entries are only ever added, never changed." />
      {entries.length === 0 ? (
        <EmptyState title="Nothing yet">Decisions, approvals, variations and revisions will be listed here as they happen.</EmptyState>
      ) : (
        <ol className="divide-y divide-line rounded-lg border border-line bg-card">
          {entries.map((e) => (
            <li key={e.id} className="flex flex-col gap-1 px-4 py-3 sm:flex-row sm:items-baseline sm:justify-between sm:gap-6">
              <p>
                <span className="font-medium">{e.actorName ?? e.actorEmail ?? "Mottle"}</span> {describeAudit(e.action, e.detail)}
              </p>
              <p className="shrink-0 text-sm text-ink-soft">
                <When iso={e.createdAt.toISOString()} />
              </p>
            </li>
          ))}
        </ol>
      )}
    </div>
  );
}
