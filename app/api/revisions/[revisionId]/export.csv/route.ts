import { exportRevisionCsv } from "@/db/queries/spec-export";
import { requireApiUser } from "@/lib/auth/session";
import { route } from "@/lib/http";
import { exportQuerySchema } from "@/lib/validation/spec";

type Context = { params: Promise<{ revisionId: string }> };

/** The revision's lines as CSV (all, or `?supplier=` one supplier's), as a download. */
export const GET = route(async (request: Request, { params }: Context) => {
  const actor = await requireApiUser();
  const { revisionId } = await params;
  const query = exportQuerySchema.parse({ supplier: new URL(request.url).searchParams.get("supplier") ?? undefined });
  const { csv, fileName } = await exportRevisionCsv(actor, revisionId, query.supplier);
  return new Response(csv, {
    headers: {
      "Content-Type": "text/csv; charset=utf-8",
      "Content-Disposition": `attachment; filename="${fileName}"`,
      "Cache-Control": "private, no-store",
      "X-Content-Type-Options": "nosniff",
    },
  });
});
