import { db } from "@/db";
import { forbidden, notFound } from "@/lib/http";
import { publicOrigin } from "@/lib/env";
import { csvFileName, specLinesCsv } from "@/lib/spec/csv";
import { readLineFinishDetails, readStudioContact } from "./spec-line-detail";
import { openRevision, readRevisionLines } from "./spec-revisions";
import type { Actor } from "./users";

/**
 * A revision as CSV. Staff: every line, or one supplier's with `supplierId`. A supplier's
 * contact: their own lines only; asking for another supplier's is refused (403).
 */
export async function exportRevisionCsv(actor: Actor, revisionId: string, supplierId?: string) {
  const { revision, project, scope } = await openRevision(actor, revisionId);
  if (scope.kind === "supplier" && supplierId && supplierId !== scope.supplierId) throw forbidden();
  const only = scope.kind === "supplier" ? scope.supplierId : supplierId;
  const lines = await readRevisionLines(db, revision.id, only);
  if (only && lines.length === 0) throw notFound(`That supplier's part of revision ${revision.letter}`);
  const supplierName = only ? (lines[0]?.supplierName ?? null) : null;
  // Finish details for the exported lines only; the photo link opens after signing in, as the page does.
  const [details, contact] = await Promise.all([
    readLineFinishDetails(lines.map((l) => l.finishId)),
    readStudioContact(project.studioId, revision.issuedBy),
  ]);
  const csv = specLinesCsv(
    revision.letter,
    lines.map((l) => {
      const detail = details.get(l.finishId ?? "");
      return {
        ...l,
        surface: detail?.surface ?? null,
        format: detail?.format ?? null,
        photoUrl: detail?.photo ? new URL(detail.photo.url, publicOrigin).toString() : null,
        orderedOn: l.order?.orderedOn ?? null,
        expectedOn: l.order?.expectedOn ?? null,
      };
    }),
    { siteAddress: project.siteAddress, installDate: project.installDate, contact },
  );
  return { csv, fileName: csvFileName(project.name, revision.letter, supplierName) };
}
