import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { getRevisionView } from "@/db/queries/spec-revision-view";
import { CautionNotes } from "@/components/spec/caution-notes";
import { ChangedLines } from "@/components/spec/changed-lines";
import { DiffList } from "@/components/spec/diff-list";
import { RevisionHash } from "@/components/spec/revision-hash";
import { RevisionSuppliers } from "@/components/spec/revision-suppliers";
import { SpecGroups } from "@/components/spec/spec-groups";
import { ViewSwitch } from "@/components/spec/view-switch";
import { Card, LinkButton, Notice, PageHeader } from "@/components/ui";
import { requireRole } from "@/lib/auth/session";
import { formatDay } from "@/lib/format";
import { pageGuard } from "@/lib/page-guard";
import { cautionsAcross } from "@/lib/spec/caution-notes";

export const metadata: Metadata = { title: "Revision" };

type Props = { params: Promise<{ projectId: string; revisionId: string }>; searchParams: Promise<{ view?: string }> };

export default async function RevisionPage({ params, searchParams }: Props) {
  const [{ projectId, revisionId }, { view }] = await Promise.all([params, searchParams]);
  const actor = await requireRole("designer");
  const rev = await pageGuard(getRevisionView(actor, revisionId));
  // A revision is shown only under its own project's address.
  if (rev.project.id !== projectId || rev.scope.kind !== "all") notFound();
  const base = `/studio/projects/${projectId}/specification`;
  const notes = cautionsAcross(rev.lines);
  const numbers = new Map(notes.map((n, i) => [n.key, i + 1]));
  const { letter } = rev.revision;
  const changed = rev.lines.flatMap((l) => (l.change ? [{ ...l, change: l.change }] : []));
  return (
    <div className="flex flex-col gap-8">
      <PageHeader
        eyebrow={<Link href={base} className="underline-offset-4 hover:underline">Specification</Link>}
        title={`Revision ${letter}`}
        description={`Issued ${formatDay(rev.revision.issuedAt.toISOString().slice(0, 10))} by ${rev.issuedBy} · ${rev.lines.length} ${rev.lines.length === 1 ? "line" : "lines"}. An issued revision never changes.`}
        actions={
          <>
            <LinkButton href={`${base}/print?revision=${rev.revision.id}`} variant="secondary">Print or save as PDF</LinkButton>
            <a href={`/api/revisions/${rev.revision.id}/export.csv`} download className="inline-flex min-h-tap items-center rounded-md border border-line-strong bg-card px-4 font-medium hover:bg-stone-50">
              Download CSV
            </a>
          </>
        }
      />
      {rev.newer && (
        <Notice title={`Revision ${rev.newer.letter} replaces this one`}>
          Suppliers order from the latest revision. <Link href={`${base}/revisions/${rev.newer.id}`}>Open revision {rev.newer.letter}</Link>.
        </Notice>
      )}
      <div className="grid items-start gap-6 lg:grid-cols-2">
        <Card title="Fingerprint">
          <RevisionHash sha256={rev.revision.sha256} verified={rev.verified} />
        </Card>
        <Card title="Suppliers">
          <RevisionSuppliers revisionId={rev.revision.id} suppliers={rev.suppliers} acknowledgements={rev.acknowledgements} />
        </Card>
      </div>
      {changed.length > 0 && (
        <Card title="Lines a variation has changed since this revision">
          <ChangedLines revisionId={rev.revision.id} letter={letter} lines={changed} canConfirm />
        </Card>
      )}
      <Card title={rev.baseline ? `What changed since revision ${rev.baseline.letter}` : "What changed"}>
        {rev.changes ? (
          <DiffList diff={rev.changes} empty={`Nothing changed since revision ${rev.baseline?.letter ?? ""}.`} />
        ) : (
          <p className="text-ink-soft">This is the first revision: every line is new.</p>
        )}
      </Card>
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 className="font-display text-2xl font-semibold">Lines</h2>
        <ViewSwitch basePath={`${base}/revisions/${rev.revision.id}`} current={view === "supplier" ? "supplier" : "room"} />
      </div>
      <SpecGroups lines={rev.lines} grouping={view === "supplier" ? "supplier" : "room"} cautionNumbers={numbers} />
      <CautionNotes notes={notes} />
    </div>
  );
}
