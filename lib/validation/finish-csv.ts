import { restoreCell } from "@/lib/csv-cell";
import { cautions, isCautionKey } from "@/lib/cautions";
import { parseMoney } from "@/lib/pricing/parse-amount";
import { finishCategoryKeys, finishCategoryLabels, finishInputSchema, type FinishInput } from "./finish";

/** Columns of the library's CSV, in the order export writes them. The first nine are required on import except supplier, code, finish and format. */
export const csvColumns = [
  "name",
  "category",
  "supplier",
  "product_code",
  "finish",
  "format",
  "unit",
  "unit_price",
  "lead_time_days",
  "colour",
  "lrv",
  "cautions",
  "care_notes",
] as const;
export type CsvColumn = (typeof csvColumns)[number];

/** Written on export for people to read; ignored on import. */
export const csvInfoColumns = ["hex", "lrv_used", "lrv_source", "colour_source", "archived", "id", "lrv_check"] as const;

export const requiredCsvColumns: CsvColumn[] = ["name", "category", "unit", "unit_price", "lead_time_days"];

// Spreadsheets people already keep name things their own way.
const aliases: Record<string, CsvColumn> = {
  code: "product_code",
  product: "product_code",
  surface: "finish",
  size: "format",
  price: "unit_price",
  price_per_unit: "unit_price",
  lead_time: "lead_time_days",
  lead_days: "lead_time_days",
  color: "colour",
  care: "care_notes",
  notes: "care_notes",
  caution: "cautions",
};

/** "Lead time (days)" → "lead_time_days"; unknown headers → null (ignored). */
export function readCsvHeader(header: string): CsvColumn | null {
  const key = header.trim().toLowerCase().replace(/\(|\)/g, " ").trim().replace(/[\s-]+/g, "_");
  if ((csvColumns as readonly string[]).includes(key)) return key as CsvColumn;
  return aliases[key] ?? null;
}

function readCategory(text: string): string {
  const t = text.trim().toLowerCase();
  const byLabel = finishCategoryKeys.find((k) => finishCategoryLabels[k].toLowerCase() === t);
  return byLabel ?? t;
}

function readCautions(text: string): { keys: string[]; unknown: string[] } {
  const parts = text.split(/[;|\n]/).map((p) => p.trim()).filter(Boolean);
  const keys: string[] = [];
  const unknown: string[] = [];
  for (const part of parts) {
    const lower = part.toLowerCase();
    const key = isCautionKey(lower) ? lower : Object.entries(cautions).find(([, c]) => c.title.toLowerCase() === lower)?.[0];
    if (key) keys.push(key);
    else unknown.push(part);
  }
  return { keys, unknown };
}

function readNumber(text: string): number | null {
  const t = text.trim();
  return t === "" || !/^-?\d+(\.\d+)?$/.test(t) ? null : Number(t);
}

const fieldToColumn: Record<string, CsvColumn> = {
  name: "name",
  category: "category",
  supplierId: "supplier",
  productCode: "product_code",
  surface: "finish",
  format: "format",
  unit: "unit",
  unitPriceCents: "unit_price",
  leadTimeDays: "lead_time_days",
  "colour.value": "colour",
  colour: "colour",
  lrv: "lrv",
  cautions: "cautions",
  careNotes: "care_notes",
};

export type CsvRowResult = { ok: true; input: FinishInput; supplierName: string | null } | { ok: false; errors: string[] };

/**
 * One data row of an import, checked by the same schema as the form. Blank colour with an LRV
 * means the maker publishes only the LRV; errors name the column, as the designer sees it.
 */
export function readCsvRow(cells: Partial<Record<CsvColumn, string>>): CsvRowResult {
  const cell = (c: CsvColumn) => restoreCell((cells[c] ?? "").trim());
  const errors: string[] = [];
  const priceRead = parseMoney(cell("unit_price"));
  const price = priceRead.ok ? priceRead.value : null;
  if (!priceRead.ok) {
    // The parser's own sentence when it says something specific ("Use a full stop for cents…").
    const specific = /^(That isn't|Enter an amount)/.test(priceRead.message) ? "" : ` ${priceRead.message}`;
    errors.push(`unit_price: "${cell("unit_price")}" isn't an amount of dollars, like 680 or 680.50.${specific}`);
  }
  const lead = readNumber(cell("lead_time_days"));
  if (cell("lead_time_days") !== "" && lead === null) errors.push(`lead_time_days: "${cell("lead_time_days")}" isn't a number of days.`);
  const lrvText = cell("lrv");
  const lrv = readNumber(lrvText);
  if (lrvText !== "" && lrv === null) errors.push(`lrv: "${lrvText}" isn't a number from 0 to 100.`);
  const found = readCautions(cell("cautions"));
  if (found.unknown.length) errors.push(`cautions: ${found.unknown.map((u) => `"${u}"`).join(", ")} isn't in the list of cautions.`);
  const category = readCategory(cell("category"));
  const knownCategory = (finishCategoryKeys as string[]).includes(category);
  if (!knownCategory) {
    errors.push(cell("category") ? `category: "${cell("category")}" isn't a category. Use one of: ${finishCategoryKeys.join(", ")}.` : "category: give the finish's category.");
  }
  const colourText = cell("colour");
  const candidate = {
    name: cell("name"),
    category,
    productCode: cell("product_code"),
    surface: cell("finish"),
    format: cell("format"),
    unit: cell("unit"),
    unitPriceCents: price ?? 0,
    leadTimeDays: lead ?? (cell("lead_time_days") === "" ? undefined : 0),
    careNotes: cell("care_notes"),
    cautions: found.keys,
    colour: colourText ? { source: "published", value: colourText } : { source: "computed" },
    lrv: lrv ?? (lrvText === "" ? null : undefined),
  };
  const parsed = finishInputSchema.safeParse(candidate);
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const column = fieldToColumn[issue.path.join(".")] ?? fieldToColumn[String(issue.path[0])] ?? String(issue.path[0] ?? "row");
      // Our own messages above already explain these columns better than the schema can.
      if ((column === "unit_price" && price === null) || (column === "lead_time_days" && lead === null && cell("lead_time_days") !== "")) continue;
      if (column === "category" && !knownCategory) continue;
      if (column === "lrv" && colourText === "" && lrvText === "") {
        errors.push("colour: give the maker's colour (like #d9d2c3) or its LRV.");
        continue;
      }
      errors.push(`${column}: ${issue.message}`);
    }
  }
  if (errors.length || !parsed.success) return { ok: false, errors: [...new Set(errors)] };
  return { ok: true, input: parsed.data, supplierName: cell("supplier") || null };
}
