import { NextResponse } from "next/server";
import { importFinishesCsv } from "@/db/queries/finish-csv";
import { requireApiUser } from "@/lib/auth/session";
import { HttpError, route } from "@/lib/http";
import { readBodyWithin } from "@/lib/request-body";

const MAX_CSV_BYTES = 5 * 1024 * 1024;

const csvTooLarge = () => new HttpError(413, "That file is larger than 5 MB. Split it and import the parts one by one.");

/** The CSV as multipart (field `file`) or as a text/csv body; the body is read no further than the limit. */
async function readCsvText(request: Request): Promise<string> {
  // Parameter values such as the multipart boundary are case-sensitive (RFC 2045 §5.1): compare a
  // lower-cased copy, but parse with the header as sent (browsers send mixed-case boundaries).
  const declared = request.headers.get("content-type") ?? "";
  const type = declared.toLowerCase();
  const multipart = type.startsWith("multipart/form-data");
  if (!multipart && !type.startsWith("text/csv") && !type.startsWith("text/plain")) {
    throw new HttpError(415, "Send the CSV as a file (multipart/form-data) or as text/csv.");
  }
  // Room for the multipart boundary and part headers around the file.
  const body = await readBodyWithin(request, MAX_CSV_BYTES + 64 * 1024, csvTooLarge);
  let text: string;
  if (multipart) {
    const file = (await new Response(body, { headers: { "content-type": declared } }).formData().catch(() => null))?.get("file");
    if (!file || typeof file === "string") throw new HttpError(400, "Choose a CSV file to import.", { file: ["Choose a CSV file to import."] });
    text = await file.text();
  } else {
    text = new TextDecoder().decode(body);
  }
  if (text.length > MAX_CSV_BYTES) throw csvTooLarge();
  return text;
}

/**
 * `?dryRun=1` reports every row that would be rejected and why, writing nothing. Without it the
 * rows are imported in one transaction, or, if any row is bad, none are (400 with the list).
 */
export const POST = route(async (request) => {
  const actor = await requireApiUser("designer");
  const dryRun = ["1", "true", "yes"].includes(new URL(request.url).searchParams.get("dryRun") ?? "");
  const report = await importFinishesCsv(actor, await readCsvText(request), dryRun);
  if (!dryRun && report.rejected.length > 0) {
    const rows = report.rejected.length === 1 ? "1 row needs" : `${report.rejected.length} rows need`;
    return NextResponse.json({ error: `${rows} fixing, so nothing was imported.`, ...report }, { status: 400 });
  }
  return NextResponse.json(report, { status: dryRun || report.imported === 0 ? 200 : 201 });
});
