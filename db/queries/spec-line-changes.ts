import { and, eq, inArray } from "drizzle-orm";
import { alias } from "drizzle-orm/sqlite-core";
import { decisions, lineConfirmations, optionLines, users, variations } from "@/db/schema";
import type { LineChange } from "@/lib/spec/line-change";
import { nameOnProject } from "./people-names";
import { decisionIdOf, type Reader } from "./spec-source";

type IssuedLine = { id: string; lineKey: string; finishId: string | null };
type Revision = { id: string; projectId: string; issuedAt: Date };

/**
 * Which lines of the latest revision an approved variation has overtaken: the decision a line came
 * from now carries an option without the line's finish, or a variation to it was approved after
 * the revision was issued. A designer's confirmation made after the latest such variation clears it.
 * Only the latest revision is asked about: an older one is replaced as a whole.
 */
export async function readLineChanges(reader: Reader, revision: Revision, lines: readonly IssuedLine[]): Promise<Map<string, LineChange>> {
  const out = new Map<string, LineChange>();
  const decisionIds = [...new Set(lines.map((l) => decisionIdOf(l.lineKey)).filter((id): id is string => id !== null))];
  if (decisionIds.length === 0) return out;
  const confirmer = alias(users, "confirmer");
  const [decisionRows, approved, confirmations] = await Promise.all([
    reader
      .select({ id: decisions.id, title: decisions.title, status: decisions.status, finishId: optionLines.finishId })
      .from(decisions)
      .leftJoin(optionLines, eq(optionLines.optionId, decisions.lockedOptionId))
      .where(and(inArray(decisions.id, decisionIds), eq(decisions.projectId, revision.projectId))),
    reader
      .select({ decisionId: variations.decisionId, decidedAt: variations.decidedAt })
      .from(variations)
      .where(and(inArray(variations.decisionId, decisionIds), eq(variations.status, "approved"))),
    reader
      .select({ confirmation: lineConfirmations, name: nameOnProject(revision.projectId, "confirmer") })
      .from(lineConfirmations)
      .leftJoin(confirmer, eq(confirmer.id, lineConfirmations.confirmedBy))
      .where(inArray(lineConfirmations.lineId, lines.map((l) => l.id))),
  ]);
  for (const line of lines) {
    const decisionId = decisionIdOf(line.lineKey);
    const rows = decisionRows.filter((d) => d.id === decisionId);
    const decision = rows[0];
    if (!decision) continue;
    const variedAt = approved
      .filter((v) => v.decisionId === decisionId && v.decidedAt)
      .map((v) => v.decidedAt?.getTime() ?? 0)
      .reduce<number | null>((a, b) => (a === null || b > a ? b : a), null);
    const carriesOther = decision.status === "locked" && !rows.some((r) => r.finishId === line.finishId);
    const variedSinceIssue = variedAt !== null && variedAt > revision.issuedAt.getTime();
    if (!carriesOther && !variedSinceIssue) continue;
    const facts = { decisionTitle: decision.title, variedAt: variedAt === null ? null : new Date(variedAt).toISOString() };
    const found = confirmations.find((c) => c.confirmation.lineId === line.id);
    const stands = found && found.confirmation.confirmedAt.getTime() >= (variedAt ?? 0);
    out.set(
      line.id,
      stands
        ? { state: "confirmed", ...facts, confirmedAt: found.confirmation.confirmedAt.toISOString(), confirmedBy: found.name, note: found.confirmation.note }
        : { state: "superseded", ...facts },
    );
  }
  return out;
}

/** The same, for one line, inside a write (recording an order, confirming). */
export async function readLineChange(reader: Reader, revision: Revision, line: IssuedLine): Promise<LineChange | null> {
  return (await readLineChanges(reader, revision, [line])).get(line.id) ?? null;
}
