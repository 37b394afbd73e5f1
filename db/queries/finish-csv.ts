import { parse } from "csv-parse/sync";
import { stringify } from "csv-stringify/sync";
import { and, asc, eq, isNotNull } from "drizzle-orm";
import { db } from "@/db";
import { writeTransaction } from "./serial-write";
import { finishes, suppliers } from "@/db/schema";
import { checkPublishedLrv } from "@/lib/colour";
import { HttpError } from "@/lib/http";
import { roundLab, settleColour } from "@/lib/validation/finish-colour";
import { neutraliseCell } from "@/lib/csv-cell";
import { csvColumns, csvInfoColumns, readCsvHeader, readCsvRow, requiredCsvColumns, type CsvColumn } from "@/lib/validation/finish-csv";
import type { FinishInput } from "@/lib/validation/finish";
import { writeAudit } from "./audit";
import { requireStudioId } from "./finishes";
import { toFinishSummary } from "./finish-dto";
import type { Actor } from "./users";

export const MAX_IMPORT_ROWS = 10_000;

/** The whole library (archived too, marked) as CSV that the import reads back. */
export async function exportFinishesCsv(actor: Actor): Promise<string> {
  const studioId = requireStudioId(actor);
  const rows = await db
    .select({ finish: finishes, supplierName: suppliers.name })
    .from(finishes)
    .leftJoin(suppliers, eq(suppliers.id, finishes.supplierId))
    .where(eq(finishes.studioId, studioId))
    .orderBy(asc(finishes.category), asc(finishes.name), asc(finishes.id));
  const records = rows.map(({ finish, supplierName }) => {
    const f = toFinishSummary({ ...finish, supplierName });
    const [L, a, b] = roundLab(f.lab);
    const text = (v: string | null) => neutraliseCell(v ?? "");
    return [
      text(f.name), f.category, text(f.supplierName), text(f.productCode), text(f.surface), text(f.format), text(f.unit),
      (f.unitPriceCents / 100).toFixed(2), String(f.leadTimeDays),
      // An LRV-only colour is rebuilt from the LRV on import, so it is left blank here.
      f.colourSource === "computed" ? "" : `lab(${L} ${a} ${b})`,
      f.lrvSource === "published" ? String(f.lrv) : "",
      f.cautions.join("; "), text(finish.careNotes),
      f.hex, String(f.lrv), f.lrvSource, f.colourSource, f.archived ? "yes" : "", f.id,
      // A published LRV far from the one its own colour implies (lib/colour/lrv-check.ts), in words.
      checkPublishedLrv(f)?.note ?? "",
    ];
  });
  return stringify([[...csvColumns, ...csvInfoColumns], ...records]);
}

export type RejectedRow = { line: number; name: string; errors: string[] };
/** `missingSuppliers`: supplier names the file uses that the studio doesn't have yet (the import screen offers to add them). */
export type ImportReport = { dryRun: boolean; total: number; valid: number; imported: number; rejected: RejectedRow[]; missingSuppliers: string[] };

type Parsed = { header: (CsvColumn | null)[]; rows: { line: number; cells: string[] }[] };

function parseCsv(text: string): Parsed {
  let records: { record: string[]; info: { lines: number } }[];
  try {
    // csv-parse types `info: true` results as string[][]; they are { record, info } pairs.
    records = parse(text, { bom: true, skip_empty_lines: true, relax_column_count: true, info: true }) as unknown as typeof records;
  } catch (error) {
    throw new HttpError(400, `That file isn't readable as CSV: ${error instanceof Error ? error.message : "unknown problem"}.`);
  }
  const [head, ...body] = records;
  if (!head) throw new HttpError(400, "That file is empty. The first line should name the columns.");
  const header = head.record.map(readCsvHeader);
  const missing = requiredCsvColumns.filter((c) => !header.includes(c));
  if (missing.length) throw new HttpError(400, `The file needs these columns: ${missing.join(", ")}. The first line should name the columns.`);
  if (body.length > MAX_IMPORT_ROWS) throw new HttpError(413, `That file has ${body.length} rows; import at most ${MAX_IMPORT_ROWS} at a time.`);
  return { header, rows: body.map((r) => ({ line: r.info.lines, cells: r.record })) };
}

type Checked = { line: number; input: FinishInput; supplierId: string | null };

/** Every row checked against the schema, the studio's suppliers and what is already in the library. */
async function checkRows(studioId: string, parsed: Parsed): Promise<{ good: Checked[]; rejected: RejectedRow[]; missing: string[] }> {
  const studioSuppliers = await db.select().from(suppliers).where(eq(suppliers.studioId, studioId));
  const supplierByName = new Map(studioSuppliers.map((s) => [s.name.trim().toLowerCase(), s]));
  const existing = await db
    .select({ supplierId: finishes.supplierId, code: finishes.productCode })
    .from(finishes)
    .where(and(eq(finishes.studioId, studioId), isNotNull(finishes.productCode)));
  const codeKey = (supplierId: string | null, code: string) => `${supplierId ?? ""}\u0000${code.toLowerCase()}`;
  const seen = new Map(existing.map((e) => [codeKey(e.supplierId, e.code ?? ""), 0]));
  const good: Checked[] = [];
  const rejected: RejectedRow[] = [];
  const missing = new Map<string, string>();
  for (const { line, cells } of parsed.rows) {
    const named: Partial<Record<CsvColumn, string>> = {};
    parsed.header.forEach((column, i) => {
      if (column && named[column] === undefined) named[column] = cells[i] ?? "";
    });
    const result = readCsvRow(named);
    const errors = result.ok ? [] : [...result.errors];
    const supplierName = (named.supplier ?? "").trim();
    const supplier = supplierName ? supplierByName.get(supplierName.toLowerCase()) : undefined;
    if (supplierName && !supplier) {
      errors.push(`supplier: there is no supplier called "${supplierName}" in your studio. Add it first, or leave the cell blank.`);
      if (!missing.has(supplierName.toLowerCase())) missing.set(supplierName.toLowerCase(), supplierName);
    }
    if (supplier?.archivedAt) errors.push(`supplier: ${supplier.name} is archived. Bring it back under Suppliers first, or leave the cell blank.`);
    const code = result.ok ? result.input.productCode : null;
    if (code && errors.length === 0) {
      const key = codeKey(supplier?.id ?? null, code);
      const previous = seen.get(key);
      if (previous !== undefined) {
        errors.push(previous === 0 ? `product_code: ${code}${supplier ? ` from ${supplier.name}` : ""} is already in the library.` : `product_code: ${code} is also on line ${previous} of this file.`);
      } else seen.set(key, line);
    }
    if (errors.length || !result.ok) rejected.push({ line, name: (named.name ?? "").trim(), errors });
    else good.push({ line, input: result.input, supplierId: supplier?.id ?? null });
  }
  return { good, rejected, missing: [...missing.values()] };
}

/**
 * Imports a CSV of finishes, all or nothing: with any rejected row nothing is written. A dry run
 * only reports. Rows go in one transaction, in batches that stay under SQLite's variable limit.
 */
export async function importFinishesCsv(actor: Actor, text: string, dryRun: boolean): Promise<ImportReport> {
  const studioId = requireStudioId(actor);
  const parsed = parseCsv(text);
  const { good, rejected, missing } = await checkRows(studioId, parsed);
  const report = { dryRun, total: parsed.rows.length, valid: good.length, imported: 0, rejected, missingSuppliers: missing };
  if (dryRun || rejected.length > 0 || good.length === 0) return report;
  const values = good.map(({ input, supplierId }) => {
    const settled = settleColour(input.colour, input.lrv ?? null);
    if (!settled) throw new Error("a checked row lost its colour");
    const { colour: _colour, lrv: _lrv, imageId: _imageId, ...fields } = input;
    const [labL, labA, labB] = settled.lab;
    return { ...fields, supplierId, studioId, labL, labA, labB, colourSource: settled.colourSource, lrv: settled.lrv, lrvSource: settled.lrvSource };
  });
  await writeTransaction(async (tx) => {
    for (let i = 0; i < values.length; i += 500) await tx.insert(finishes).values(values.slice(i, i + 500));
    await writeAudit({ studioId, actorId: actor.userId, action: "finish.imported", entityType: "studio", entityId: studioId, detail: { rows: values.length } }, tx);
  });
  return { ...report, imported: values.length };
}
