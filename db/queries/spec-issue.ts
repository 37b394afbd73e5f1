import { and, eq, inArray } from "drizzle-orm";
import { db } from "@/db";
import { lineOrders, projectMembers, specLines, specRevisions, users, type Project } from "@/db/schema";
import { conflict } from "@/lib/http";
import { diffLines, hasChanges } from "@/lib/spec/diff";
import { letterForSequence } from "@/lib/spec/letters";
import { hashRevision, serialiseRevision } from "@/lib/spec/revision-content";
import type { SpecLineContent } from "@/lib/spec/types";
import { writeAudit } from "./audit";
import { getProjectForStaff } from "./projects";
import { readCurrentLines } from "./spec-source";
import { writeTransaction, type Tx } from "./serial-write";
import { readLatestRevision, readRevisionLines } from "./spec-revisions";
import type { Actor } from "./users";

function errorCodes(error: unknown): string {
  const parts: string[] = [];
  for (let e: unknown = error, depth = 0; e instanceof Error && depth < 5; e = e.cause, depth++) {
    parts.push(e.message, String((e as { code?: unknown }).code ?? ""));
  }
  return parts.join(" ");
}

/** The database refused because another writer got there first (unique letter, or the lock). */
export function isRaceLost(error: unknown): boolean {
  return /SQLITE_CONSTRAINT_UNIQUE|UNIQUE constraint failed|SQLITE_BUSY|database is locked/i.test(errorCodes(error));
}

export type IssuedRevision = {
  project: Project;
  revision: { id: string; letter: string; sequence: number; sha256: string; issuedAt: Date };
  lines: SpecLineContent[];
  /** The contacts of each supplier with lines in the revision, for the "revision issued" e-mail. */
  recipients: { supplierId: string; supplierName: string; lineCount: number; emails: string[] }[];
};

type Frozen = { revision: { id: string; letter: string; sequence: number; sha256: string; issuedAt: Date }; lines: SpecLineContent[] };

/**
 * Inside the transaction: read the specification, compare it with the last revision, write the
 * revision, its lines, the order dates of lines that did not change, and the audit entry.
 */
async function freezeRevision(tx: Tx, actor: Actor, project: Project): Promise<Frozen> {
  const lines = await readCurrentLines(tx, project);
  if (lines.length === 0) throw conflict("There is nothing to issue yet: lock a decision or add a fixed item first.");
  const last = await readLatestRevision(tx, project.id);
  const lastLines = last ? await readRevisionLines(tx, last.id) : [];
  const diff = diffLines(lastLines, lines);
  if (last && !hasChanges(diff)) throw conflict(`Nothing has changed since revision ${last.letter}, so there is nothing new to issue.`);
  const sequence = (last?.sequence ?? 0) + 1;
  const letter = letterForSequence(sequence);
  const content = serialiseRevision({ letter, projectId: project.id, lines });
  const [revision] = await tx
    .insert(specRevisions)
    .values({ projectId: project.id, letter, sequence, issuedBy: actor.userId, content, sha256: hashRevision(content) })
    .returning();
  if (!revision) throw new Error("revision insert returned nothing");
  const inserted = await tx
    .insert(specLines)
    .values(lines.map((l) => ({ ...l, revisionId: revision.id })))
    .returning({ id: specLines.id, lineKey: specLines.lineKey });
  // An unchanged line is the same order: the supplier need not record its dates again.
  const changedKeys = new Set([...diff.changed.map((c) => c.lineKey), ...diff.added.map((l) => l.lineKey)]);
  const carried = lastLines.filter((l) => l.order && !changedKeys.has(l.lineKey));
  if (carried.length) {
    const newIds = new Map(inserted.map((l) => [l.lineKey, l.id]));
    const keyOf = new Map(carried.map((l) => [l.id, l.lineKey]));
    const prior = await tx.select().from(lineOrders).where(inArray(lineOrders.lineId, carried.map((l) => l.id)));
    const copies = prior.flatMap((o) => {
      const lineId = newIds.get(keyOf.get(o.lineId) ?? "");
      return lineId ? [{ ...o, lineId }] : [];
    });
    if (copies.length) await tx.insert(lineOrders).values(copies);
  }
  await writeAudit(
    {
      studioId: project.studioId,
      projectId: project.id,
      actorId: actor.userId,
      action: "revision.issued",
      entityType: "spec_revision",
      entityId: revision.id,
      detail: { letter, sha256: revision.sha256, lines: lines.length, added: diff.added.length, removed: diff.removed.length, changed: diff.changed.length },
    },
    tx,
  );
  const { id, issuedAt } = revision;
  return { revision: { id, letter, sequence, sha256: revision.sha256, issuedAt }, lines };
}

/**
 * Freezes the current specification as the next revision, in one transaction: the letter, the
 * canonical content and its SHA-256, the lines, and order dates carried over for lines that did
 * not change. Refused (409) when there is nothing to issue or nothing changed since the last one.
 * Writes in this process queue one after another (serial-write.ts); across processes the unique
 * (project, sequence) index decides, and the loser answers 409.
 */
export async function issueRevision(actor: Actor, projectId: string): Promise<IssuedRevision> {
  const project = await getProjectForStaff(actor, projectId);
  let frozen: Frozen;
  try {
    frozen = await writeTransaction((tx) => freezeRevision(tx, actor, project));
  } catch (error) {
    if (isRaceLost(error)) throw conflict("Another revision was issued at the same moment. Reload to see it, and issue again only if something is still missing.");
    throw error;
  }
  const recipients = await readRecipients(project.id, frozen.lines);
  return { project, ...frozen, recipients };
}

/** Supplier contacts are the project's members with the supplier role for that company. */
async function readRecipients(projectId: string, lines: SpecLineContent[]) {
  const bySupplier = new Map<string, { supplierName: string; lineCount: number }>();
  for (const l of lines) {
    if (!l.supplierId) continue;
    const entry = bySupplier.get(l.supplierId) ?? { supplierName: l.supplierName ?? "", lineCount: 0 };
    entry.lineCount += 1;
    bySupplier.set(l.supplierId, entry);
  }
  if (bySupplier.size === 0) return [];
  const contacts = await db
    .select({ supplierId: projectMembers.supplierId, email: users.email })
    .from(projectMembers)
    .innerJoin(users, eq(users.id, projectMembers.userId))
    .where(and(eq(projectMembers.projectId, projectId), eq(projectMembers.role, "supplier"), inArray(projectMembers.supplierId, [...bySupplier.keys()])));
  return [...bySupplier].map(([supplierId, s]) => ({
    supplierId,
    ...s,
    emails: contacts.filter((c) => c.supplierId === supplierId).map((c) => c.email),
  }));
}
