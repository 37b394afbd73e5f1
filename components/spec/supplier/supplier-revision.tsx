"use client";

import { useQuery } from "@tanstack/react-query";
import Link from "next/link";
import { Card, Notice } from "@/components/ui";
import { formatDay } from "@/lib/format";
import { cautionsAcross } from "@/lib/spec/caution-notes";
import type { RevisionJson } from "@/lib/spec/revision-json";
import { CautionNotes } from "../caution-notes";
import { DiffList } from "../diff-list";
import { AcknowledgePanel } from "./acknowledge-panel";
import { fetchRevision, revisionKey } from "./api";
import { RevisionFacts } from "./revision-facts";
import { SupplierLineCard } from "./supplier-line-card";

function changeOf(rev: RevisionJson, lineKey: string) {
  if (!rev.changes) return null;
  const since = rev.changes.since.letter;
  if (rev.changes.added.some((l) => l.lineKey === lineKey)) return { kind: "added" as const, since };
  if (rev.changes.changed.some((c) => c.lineKey === lineKey)) return { kind: "changed" as const, since };
  return null;
}

/** A supplier's view of one revision: acknowledge it, see what changed for them, record order dates. */
export function SupplierRevision({ initial }: { initial: RevisionJson }) {
  const { data: rev } = useQuery({ queryKey: revisionKey(initial.id), queryFn: () => fetchRevision(initial.id), initialData: initial });
  const ack = rev.acknowledgements[0] ?? null;
  const canRecord = Boolean(ack) && !rev.newer;
  const overtaken = rev.lines.filter((l) => l.change?.state === "superseded").length;
  const whyNot = rev.newer
    ? `Revision ${rev.newer.letter} replaces this one: record order dates there.`
    : `Acknowledge revision ${rev.letter} above to record order dates.`;
  return (
    <div className="flex flex-col gap-6">
      <header className="flex flex-col gap-1">
        <p className="text-sm font-medium uppercase tracking-[0.08em] text-stone-600">{rev.project.name}</p>
        <h1 className="font-display text-3xl font-semibold">Revision {rev.letter}</h1>
        <p className="text-ink-soft">
          Issued {formatDay(rev.issuedAt.slice(0, 10))} by {rev.issuedBy}. {rev.lines.length} {rev.lines.length === 1 ? "line" : "lines"} for you.
        </p>
      </header>
      {!rev.newer && overtaken > 0 && (
        <Notice tone="caution" title={overtaken === 1 ? "One of your lines has changed" : `${overtaken} of your lines have changed`}>
          A variation was approved after this revision was issued. A new revision is coming; until then, don&apos;t order the lines marked as changed below.
        </Notice>
      )}
      {rev.newer && (
        <Notice tone="caution" title={`Revision ${rev.newer.letter} replaces this one`}>
          Order from the latest revision. <Link href={`/supplier/revisions/${rev.newer.id}`}>Open revision {rev.newer.letter}</Link>
        </Notice>
      )}
      <Card>
        <RevisionFacts project={rev.project} contact={rev.contact} />
      </Card>
      <Card>
        <AcknowledgePanel revisionId={rev.id} letter={rev.letter} acknowledgedAt={ack?.acknowledgedAt ?? null} byName={ack?.byName ?? null} replaced={Boolean(rev.newer)} />
      </Card>
      <Card title={rev.changes ? `What changed for you since revision ${rev.changes.since.letter}` : "What's new for you"} level={2}>
        {rev.changes ? (
          <DiffList diff={rev.changes} empty={`None of your lines changed since revision ${rev.changes.since.letter}.`} />
        ) : (
          <p className="text-ink-soft">You haven&apos;t acknowledged an earlier revision of this project, so every line below is new to you.</p>
        )}
      </Card>
      <section aria-labelledby="your-lines" className="flex flex-col gap-3">
        <h2 id="your-lines" className="font-display text-2xl font-semibold">
          Your lines
        </h2>
        <ul className="flex flex-col gap-4">
          {rev.lines.map((line) => (
            <SupplierLineCard key={line.id} revisionId={rev.id} letter={rev.letter} line={line} canRecord={canRecord} whyNot={whyNot} change={changeOf(rev, line.lineKey)} />
          ))}
        </ul>
      </section>
      <CautionNotes notes={cautionsAcross(rev.lines)} />
      <div className="flex flex-col gap-2 border-t border-line pt-4 text-sm text-ink-soft">
        <a href={`/api/revisions/${rev.id}/export.csv`} download className="inline-flex min-h-tap items-center text-base text-spruce underline underline-offset-4">
          Download your lines as CSV
        </a>
        <p>
          Revision fingerprint (SHA-256): <span className="break-all font-mono">{rev.sha256}</span>
        </p>
      </div>
    </div>
  );
}
