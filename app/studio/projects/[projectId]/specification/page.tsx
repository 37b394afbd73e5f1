import type { Metadata } from "next";
import { getSpecificationView } from "@/db/queries/spec";
import { listFixedItems } from "@/db/queries/spec-fixed-items";
import { readContacts } from "@/db/queries/spec-handoff-view";
import { listChangedIssuedLines, listRevisionsForActor } from "@/db/queries/spec-revision-view";
import { ChangedLines } from "@/components/spec/changed-lines";
import { CautionNotes } from "@/components/spec/caution-notes";
import { FixedItemList } from "@/components/spec/fixed-item-list";
import { IssueRevisionForm } from "@/components/spec/issue-revision-form";
import { RevisionList } from "@/components/spec/revision-list";
import { SpecGroups } from "@/components/spec/spec-groups";
import { SpecOverview } from "@/components/spec/spec-overview";
import { ViewSwitch } from "@/components/spec/view-switch";
import { Card, EmptyState, LinkButton, PageHeader, Section } from "@/components/ui";
import { requireRole } from "@/lib/auth/session";
import { pageGuard } from "@/lib/page-guard";
import { cautionsAcross } from "@/lib/spec/caution-notes";
import { hasChanges } from "@/lib/spec/diff";
import { groupBySupplier } from "@/lib/spec/group";
import { letterForSequence } from "@/lib/spec/letters";

export const metadata: Metadata = { title: "Specification" };

type Props = { params: Promise<{ projectId: string }>; searchParams: Promise<{ view?: string; issue?: string }> };

export default async function SpecificationPage({ params, searchParams }: Props) {
  const [{ projectId }, { view, issue }] = await Promise.all([params, searchParams]);
  const actor = await requireRole("designer");
  const [spec, revisions, fixed, changedIssued] = await pageGuard(
    Promise.all([
      getSpecificationView(actor, projectId),
      listRevisionsForActor(actor, projectId),
      listFixedItems(actor, projectId),
      listChangedIssuedLines(actor, projectId),
    ]),
  );
  const contacts = await readContacts(spec.project.id);
  const base = `/studio/projects/${spec.project.id}/specification`;
  const grouping = view === "supplier" ? "supplier" : "room";
  const nextLetter = letterForSequence((revisions[0]?.sequence ?? 0) + 1);
  const suppliers = groupBySupplier(spec.lines)
    .filter((g) => g.key)
    .map((g) => ({ name: g.title, lineCount: g.lines.length, contacts: contacts.filter((c) => c.supplierId === g.key).length }));
  const disabledReason =
    spec.lines.length === 0
      ? "Nothing to issue yet: lock a decision or add a fixed item first."
      : spec.latest && spec.changes && !hasChanges(spec.changes)
        ? `Nothing new to issue: the specification matches revision ${spec.latest.letter}.`
        : null;
  const notes = cautionsAcross(spec.lines);
  const numbers = new Map(notes.map((n, i) => [n.key, i + 1]));
  return (
    <div className="flex flex-col gap-8">
      <PageHeader
        eyebrow="Specification"
        title="Current specification"
        description="Locked decisions and fixed items, as the trades will order them. Decisions still open are shown but never issued."
        actions={<LinkButton href={`${base}/print`} variant="secondary">Print or save as PDF</LinkButton>}
      />
      <SpecOverview
        lineCount={spec.lines.length}
        pendingCount={spec.pending.length}
        lateCount={spec.lateCount}
        installDate={spec.project.installDate}
        latest={spec.latest}
        changes={spec.changes}
        issue={
          <IssueRevisionForm
            projectId={spec.project.id}
            nextLetter={nextLetter}
            lineCount={spec.lines.length}
            suppliers={suppliers}
            disabledReason={disabledReason}
            startConfirming={issue === "confirm"}
            specPath={base}
            grouping={grouping}
          />
        }
      />
      {changedIssued && changedIssued.lines.length > 0 && (
        <Section
          id="changed-lines"
          title={`Issued lines a variation has changed (revision ${changedIssued.revision.letter})`}
          description="Their suppliers can't record an order on them until you issue a new revision, or confirm the issued line stands."
        >
          <ChangedLines revisionId={changedIssued.revision.id} letter={changedIssued.revision.letter} lines={changedIssued.lines} canConfirm />
        </Section>
      )}
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h2 className="sr-only">Schedule</h2>
        <ViewSwitch basePath={base} current={grouping} />
      </div>
      {spec.lines.length === 0 && spec.pending.length === 0 ? (
        <EmptyState
          title="Nothing in the specification yet"
          action={
            <>
              <LinkButton href={`/studio/projects/${spec.project.id}/decisions`}>Go to the decisions</LinkButton>
              <LinkButton href={`${base}/fixed-items/new`} variant="secondary">
                Add a fixed item
              </LinkButton>
              <LinkButton href="/studio/suppliers" variant="secondary">
                Add the suppliers and trades you order from
              </LinkButton>
            </>
          }
        >
          Lines arrive here when a client approves a decision, or when you add a fixed item such as an appliance. Each line goes to the supplier of
          its finish, so give your finishes a supplier.
        </EmptyState>
      ) : (
        <SpecGroups lines={spec.lines} pending={spec.pending} grouping={grouping} cautionNumbers={numbers} />
      )}
      <CautionNotes notes={notes} />
      <Section
        id="fixed-items"
        title="Fixed items"
        description="Things the specification carries without a client choice: appliances, downlights, the floor."
        actions={<LinkButton href={`${base}/fixed-items/new`}>Add a fixed item</LinkButton>}
      >
        <FixedItemList
          projectId={spec.project.id}
          items={fixed}
          empty={<EmptyState title="No fixed items" level={3}>Add appliances, lighting or anything else that needs no client choice.</EmptyState>}
        />
      </Section>
      <Section title="Issued revisions" description="Each revision is frozen when issued; its hash shows it hasn't changed since.">
        {revisions.length ? (
          <Card>
            <RevisionList revisions={revisions} hrefFor={(id) => `${base}/revisions/${id}`} />
          </Card>
        ) : (
          <EmptyState title="No revisions yet" level={3}>Issue the first revision when the locked lines are ready to order.</EmptyState>
        )}
      </Section>
    </div>
  );
}
