import type { SpecDiff } from "./diff";
import type { LineChange } from "./line-change";
import type { LineFinishDetail, StudioContact } from "./line-detail";
import type { LineStatus } from "./status";
import type { SpecLineContent } from "./types";

/** A revision as GET /api/revisions/:id answers it (dates as ISO strings), for pages and clients alike. */
export type RevisionJson = {
  id: string;
  letter: string;
  sequence: number;
  issuedAt: string;
  sha256: string;
  verified: boolean;
  issuedBy: string;
  /** Who at the studio answers questions about this revision (lib/spec/line-detail.ts). */
  contact: StudioContact | null;
  project: { id: string; name: string; siteAddress: string | null; installDate: string | null };
  scope: { kind: "all" } | { kind: "supplier"; supplierId: string };
  /** The canonical text the hash is of: staff only (it holds every supplier's lines). */
  content: string | null;
  lines: (SpecLineContent &
    LineFinishDetail & {
      id: string;
      order: { orderedOn: string | null; expectedOn: string | null } | null;
      status: LineStatus;
      /** An approved variation overtook the line after it was issued (lib/spec/line-change.ts). */
      change: LineChange | null;
    })[];
  acknowledgements: { supplierId: string; acknowledgedAt: string; byName: string | null; byEmail: string }[];
  changes: (SpecDiff & { since: { id: string; letter: string } }) | null;
  newer: { id: string; letter: string } | null;
  suppliers: { supplierId: string; supplierName: string; lineCount: number }[];
};

type View = {
  revision: { id: string; letter: string; sequence: number; issuedAt: Date; sha256: string };
  verified: boolean;
  issuedBy: string;
  contact: StudioContact | null;
  project: RevisionJson["project"];
  scope: RevisionJson["scope"];
  content: string | null;
  lines: RevisionJson["lines"];
  acknowledgements: { supplierId: string; acknowledgedAt: Date; byName: string | null; byEmail: string }[];
  baseline: { id: string; letter: string } | null;
  changes: SpecDiff | null;
  newer: { id: string; letter: string } | null;
  suppliers: RevisionJson["suppliers"];
};

export function toRevisionJson(view: View): RevisionJson {
  return {
    ...view.revision,
    issuedAt: view.revision.issuedAt.toISOString(),
    verified: view.verified,
    issuedBy: view.issuedBy,
    contact: view.contact,
    project: view.project,
    scope: view.scope,
    content: view.content,
    lines: view.lines,
    acknowledgements: view.acknowledgements.map((a) => ({ ...a, acknowledgedAt: a.acknowledgedAt.toISOString() })),
    changes: view.changes && view.baseline ? { since: { id: view.baseline.id, letter: view.baseline.letter }, ...view.changes } : null,
    newer: view.newer ? { id: view.newer.id, letter: view.newer.letter } : null,
    suppliers: view.suppliers,
  };
}
