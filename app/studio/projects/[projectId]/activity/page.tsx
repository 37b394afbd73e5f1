import type { Metadata } from "next";
import { listActivityPeople, readActivityPage } from "@/db/queries/audit";
import { getProjectForStaff } from "@/db/queries/projects";
import { ActivityFilter } from "@/components/activity/activity-filter";
import { ActivityList } from "@/components/activity/activity-list";
import { EmptyState, PageHeader } from "@/components/ui";
import { isActivityKind } from "@/lib/activity/kinds";
import { requireRole } from "@/lib/auth/session";
import { pageGuard } from "@/lib/page-guard";

export const metadata: Metadata = { title: "Activity" };

type Props = { params: Promise<{ projectId: string }>; searchParams: Promise<{ kind?: string; person?: string; page?: string }> };

/** The project's audit log: everything anyone did, newest first, 50 to a page. Studio staff only. */
export default async function ProjectActivityPage({ params, searchParams }: Props) {
  const [{ projectId }, query] = await Promise.all([params, searchParams]);
  const actor = await requireRole("designer");
  const project = await pageGuard(getProjectForStaff(actor, projectId));
  const kind = isActivityKind(query.kind) ? query.kind : null;
  const people = await listActivityPeople(project.studioId, project.id);
  const actorId = people.some((p) => p.id === query.person) ? (query.person ?? null) : null;
  const requested = Number.parseInt(query.page ?? "1", 10);
  const log = await readActivityPage(project.studioId, project.id, {
    ...(kind ? { kind } : {}),
    ...(actorId ? { actorId } : {}),
    page: Number.isFinite(requested) && requested > 0 ? requested : 1,
  });
  const base = `/studio/projects/${project.id}/activity`;
  const hrefFor = (page: number) => {
    const search = new URLSearchParams({ ...(kind ? { kind } : {}), ...(actorId ? { person: actorId } : {}), ...(page > 1 ? { page: String(page) } : {}) });
    return search.size ? `${base}?${search}` : base;
  };
  const filtered = kind !== null || actorId !== null;
  return (
    <div className="space-y-8">
      <PageHeader
        title="Activity"
        description="Everything done on this project, newest first, each at the time it happened. Entries are only ever added, never changed; a run of edits to a sample board shows as one."
      />
      <ActivityFilter action={base} kind={kind} actorId={actorId} people={people} />
      {log.entries.length === 0 ? (
        <EmptyState title={filtered ? "Nothing of that kind" : "Nothing yet"}>
          {filtered ? "Nothing on this project matches. Show everything to see the whole log." : "Decisions, approvals, variations and revisions will be listed here as they happen."}
        </EmptyState>
      ) : (
        <ActivityList
          entries={log.entries.map((e) => ({ key: e.key, actorName: e.actorName, action: e.action, detail: e.detail, parts: e.parts, at: e.at.toISOString(), firstAt: e.firstAt.toISOString() }))}
          page={log.page}
          pageCount={log.pageCount}
          hrefFor={hrefFor}
        />
      )}
    </div>
  );
}
