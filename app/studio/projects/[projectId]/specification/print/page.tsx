import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { getSpecificationView } from "@/db/queries/spec";
import { getRevisionView } from "@/db/queries/spec-revision-view";
import { PrintControls, type Paper } from "@/components/spec/print-controls";
import { PrintSheet } from "@/components/spec/print-sheet";
import { requireRole } from "@/lib/auth/session";
import { formatDay } from "@/lib/format";
import { pageGuard } from "@/lib/page-guard";
import { cssString } from "@/lib/spec/format";

export const metadata: Metadata = { title: "Print specification" };

type Props = { params: Promise<{ projectId: string }>; searchParams: Promise<{ revision?: string; paper?: string }> };

/**
 * A4 and US Letter differ by 6 mm in width and 18 mm in height, so one layout fits both; the
 * paper choice sets the page box so the browser's preview and page count are right.
 */
function pageStyle(paper: Paper, footer: string) {
  return `@page { size: ${paper === "letter" ? "letter" : "A4"} portrait; margin: 14mm 12mm 16mm;
  @bottom-left { content: ${cssString(footer)}; font: 7.5pt sans-serif; color: #333; }
  @bottom-right { content: "Page " counter(page) " of " counter(pages); font: 7.5pt sans-serif; color: #333; } }
@media print { #main { padding: 0 !important; max-width: none !important; } .print-table tr { break-inside: avoid; } }`;
}

export default async function PrintSpecificationPage({ params, searchParams }: Props) {
  const [{ projectId }, { revision: revisionId, paper: paperParam }] = await Promise.all([params, searchParams]);
  const actor = await requireRole("designer");
  const paper: Paper = paperParam === "letter" ? "letter" : "a4";
  const base = `/studio/projects/${projectId}/specification`;
  const studio = actor.studio?.name ?? "";
  let sheet;
  let footer: string;
  if (revisionId) {
    const rev = await pageGuard(getRevisionView(actor, revisionId));
    if (rev.project.id !== projectId) notFound();
    const { letter, issuedAt, sha256 } = rev.revision;
    footer = `${rev.project.name} · Revision ${letter} · SHA-256 ${sha256.slice(0, 16)}…`;
    sheet = (
      <PrintSheet
        heading={`Specification, revision ${letter}`}
        draft={false}
        lines={rev.lines}
        facts={[
          { label: "Project", value: [rev.project.name, rev.project.siteAddress].filter(Boolean).join(", ") },
          { label: "Studio", value: studio },
          { label: "Issued", value: `${formatDay(issuedAt.toISOString().slice(0, 10))} by ${rev.issuedBy}` },
          { label: "Install", value: formatDay(rev.project.installDate) },
          { label: "SHA-256", value: <span className="break-all font-mono text-[8.5pt]">{sha256}</span> },
        ]}
      />
    );
  } else {
    const spec = await pageGuard(getSpecificationView(actor, projectId));
    footer = `${spec.project.name} · Working draft, not issued · printed ${spec.today}`;
    sheet = (
      <PrintSheet
        heading="Specification, working draft"
        draft
        lines={spec.lines}
        pending={spec.pending}
        facts={[
          { label: "Project", value: [spec.project.name, spec.project.siteAddress].filter(Boolean).join(", ") },
          { label: "Studio", value: studio },
          { label: "Printed", value: formatDay(spec.today) },
          { label: "Install", value: formatDay(spec.project.installDate) },
          { label: "Latest issued", value: spec.latest ? `Revision ${spec.latest.letter}` : "none yet" },
        ]}
      />
    );
  }
  const query = (p: Paper) => `${base}/print?${new URLSearchParams({ ...(revisionId ? { revision: revisionId } : {}), paper: p })}`;
  return (
    <div className="flex flex-col gap-6">
      <style>{pageStyle(paper, footer)}</style>
      <PrintControls paper={paper} hrefs={{ a4: query("a4"), letter: query("letter") }} backHref={revisionId ? `${base}/revisions/${revisionId}` : base} />
      {sheet}
    </div>
  );
}
