import { db } from "@/db";
import { changedFields, diffLines } from "@/lib/spec/diff";
import { isLate, lineStatus, type LineStatus } from "@/lib/spec/status";
import type { SpecLineContent } from "@/lib/spec/types";
import { todayUtc } from "./attention";
import { getProjectForStaff } from "./projects";
import { decisionIdOf, readCurrentLines, readDecisionsWithOpenVariations, readPendingDecisions } from "./spec-source";
import { readLatestRevision, readRevisionLines, type LineOrderDates } from "./spec-revisions";
import type { Actor } from "./users";

/** Whether a current line is in the latest revision as it stands now. */
export type IssueState = "issued" | "changed" | "new";

export type CurrentLine = SpecLineContent & {
  issueState: IssueState;
  status: LineStatus;
  order: LineOrderDates | null;
  /** Its decision has a variation requested or priced: the line may still change. */
  variationPending: boolean;
};

/**
 * The current specification of a project for its studio: locked decisions and fixed items as
 * lines, each with where it stands against the latest revision and its order, the decisions
 * still open (pending rows, never issued), and what changed since the latest revision.
 */
export async function getSpecificationView(actor: Actor, projectId: string, today = todayUtc()) {
  const project = await getProjectForStaff(actor, projectId);
  const [current, pending, varied, latest] = await Promise.all([
    readCurrentLines(db, project),
    readPendingDecisions(db, project.id),
    readDecisionsWithOpenVariations(db, project.id),
    readLatestRevision(db, project.id),
  ]);
  const issuedLines = latest ? await readRevisionLines(db, latest.id) : [];
  const issuedByKey = new Map(issuedLines.map((l) => [l.lineKey, l]));
  const lines: CurrentLine[] = current.map((line) => {
    const issued = issuedByKey.get(line.lineKey);
    const issueState: IssueState = !issued ? "new" : changedFields(issued, line).length ? "changed" : "issued";
    // An order placed against an older version of a line is not an order for this one.
    const order = issueState === "issued" ? (issued?.order ?? null) : null;
    const decisionId = decisionIdOf(line.lineKey);
    return {
      ...line,
      issueState,
      order,
      status: lineStatus({ orderByDate: line.orderByDate, order, today, installDate: project.installDate }),
      variationPending: decisionId !== null && varied.has(decisionId),
    };
  });
  const changes = latest ? diffLines(issuedLines, current) : null;
  return {
    project,
    lines,
    pending,
    latest: latest ? { id: latest.id, letter: latest.letter, issuedAt: latest.issuedAt } : null,
    changes,
    lateCount: lines.filter((l) => isLate(l.status)).length,
    today,
  };
}

export type SpecificationView = Awaited<ReturnType<typeof getSpecificationView>>;
