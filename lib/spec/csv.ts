import { stringify } from "csv-stringify/sync";
import { neutraliseCell } from "@/lib/csv-cell";
import { cautionTitles } from "./caution-notes";
import type { LineFinishDetail, StudioContact } from "./line-detail";
import type { SpecLineContent } from "./types";

export type CsvLine = SpecLineContent &
  Partial<Pick<LineFinishDetail, "surface" | "format">> & { orderedOn?: string | null; expectedOn?: string | null; photoUrl?: string | null };

/** The same on every row (so a filtered or sorted sheet still says where and whom to ask). */
export type CsvContext = { siteAddress: string | null; installDate: string | null; contact: StudioContact | null };

export const csvHeader = [
  "Revision",
  "Room",
  "Item",
  "Location",
  "Finish",
  "Surface",
  "Format",
  "Product code",
  "Supplier",
  "Quantity",
  "Unit",
  "Lead time (days)",
  "Order by",
  "Cautions",
  "Ordered on",
  "Expected on",
  "Line reference",
  "Photo",
  "Site address",
  "Install date",
  "Studio contact",
  "Contact e-mail",
  "Contact phone",
] as const;

function text(value: string | null | undefined): string {
  return value ? neutraliseCell(value) : "";
}

/**
 * One revision's lines as CSV: UTF-8 with a byte-order mark (so spreadsheets pick the encoding
 * and "m²" survives), a header row, CRLF line ends as RFC 4180 has them.
 */
export function specLinesCsv(letter: string, lines: readonly CsvLine[], context?: CsvContext): string {
  const contact = context?.contact;
  const shared = [
    text(context?.siteAddress),
    context?.installDate ?? "",
    text(contact ? `${contact.name}, ${contact.studioName}` : null),
    text(contact?.email),
    text(contact?.phone),
  ];
  const rows = [...lines]
    .sort((a, b) => a.sortOrder - b.sortOrder)
    .map((l) => [
      letter,
      text(l.room),
      text(l.item),
      text(l.location),
      text(l.finishName),
      text(l.surface),
      text(l.format),
      text(l.productCode),
      text(l.supplierName),
      l.quantity,
      text(l.unit),
      l.leadTimeDays,
      l.orderByDate ?? "",
      text(cautionTitles(l.cautions).join("; ")),
      l.orderedOn ?? "",
      l.expectedOn ?? "",
      l.lineKey,
      text(l.photoUrl),
      ...shared,
    ]);
  return stringify([[...csvHeader], ...rows], { bom: true, record_delimiter: "windows" });
}

function slug(value: string): string {
  const s = value
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "")
    .slice(0, 60);
  return s || "project";
}

/** A file name any system accepts: ASCII letters, digits and hyphens, e.g. "marrow-street-terrace-revision-b.csv". */
export function csvFileName(projectName: string, letter: string, supplierName?: string | null): string {
  const parts = [slug(projectName), `revision-${letter.toLowerCase()}`, ...(supplierName ? [slug(supplierName)] : [])];
  return `${parts.join("-")}.csv`;
}
