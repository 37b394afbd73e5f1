import { exportFinishesCsv } from "@/db/queries/finish-csv";
import { requireApiUser } from "@/lib/auth/session";
import { route } from "@/lib/http";

/** The studio's whole library as CSV (the columns the import reads, plus a few for reading only). */
export const GET = route(async () => {
  const actor = await requireApiUser("designer");
  const csv = await exportFinishesCsv(actor);
  const day = new Date().toISOString().slice(0, 10);
  return new Response(csv, {
    headers: {
      "Content-Type": "text/csv; charset=utf-8",
      "Content-Disposition": `attachment; filename="finishes-${day}.csv"`,
      "Cache-Control": "private, no-store",
    },
  });
});
