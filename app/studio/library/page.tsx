import { dehydrate, HydrationBoundary, QueryClient } from "@tanstack/react-query";
import type { Metadata } from "next";
import { listFinishes } from "@/db/queries/finish-list";
import { listActiveSuppliers } from "@/db/queries/suppliers";
import { FinishTable } from "@/components/library/finish-table";
import { libraryKeys } from "@/components/library/library-api";
import { EmptyState, LinkButton, PageHeader } from "@/components/ui";
import { requireRole } from "@/lib/auth/session";
import { finishListQuerySchema } from "@/lib/validation/finish";

export const metadata: Metadata = { title: "Library" };

type Props = { searchParams: Promise<Record<string, string | string[] | undefined>> };

export default async function LibraryPage({ searchParams }: Props) {
  const actor = await requireRole("designer");
  const studioId = actor.studio?.id ?? "";
  const raw = Object.fromEntries(Object.entries(await searchParams).filter((e): e is [string, string] => typeof e[1] === "string"));
  // A hand-edited address with a bad value shows the first page rather than an error.
  const parsed = finishListQuerySchema.safeParse(raw);
  const query = parsed.success ? parsed.data : finishListQuerySchema.parse({});
  const queryClient = new QueryClient();
  const [suppliers] = await Promise.all([
    listActiveSuppliers(studioId),
    queryClient.prefetchQuery({ queryKey: libraryKeys.page(query), queryFn: () => listFinishes(studioId, query) }),
  ]);
  // Unfiltered and nothing found: a new studio's library, which says how to start rather than "no match".
  const firstPage = queryClient.getQueryData<{ total: number }>(libraryKeys.page(query));
  const isNewLibrary = Object.keys(raw).length === 0 && firstPage?.total === 0;
  return (
    <div className="space-y-6">
      <PageHeader
        eyebrow={actor.studio?.name}
        title="Library"
        description="Every finish the studio specifies, with its colour, supplier, price and lead time."
        actions={
          <>
            <LinkButton href="/studio/library/import" variant="secondary">
              Import or export CSV
            </LinkButton>
            <LinkButton href="/studio/library/new">Add a finish</LinkButton>
          </>
        }
      />
      {isNewLibrary ? (
        <EmptyState
          title="Add finishes to your library"
          action={
            <>
              <LinkButton href="/studio/library/new">Add a finish</LinkButton>
              <LinkButton href="/studio/library/import" variant="secondary">
                Import a CSV
              </LinkButton>
              {suppliers.length === 0 && (
                <LinkButton href="/studio/suppliers" variant="secondary">
                  Add the suppliers and trades you order from
                </LinkButton>
              )}
            </>
          }
        >
          Every board, decision and specification draws on the finishes here: the stone, cabinetry, tile and fittings you specify, with their
          supplier, price and lead time.
        </EmptyState>
      ) : (
        <HydrationBoundary state={dehydrate(queryClient)}>
          <FinishTable initialQuery={query} suppliers={suppliers.map((s) => ({ id: s.id, name: s.name }))} />
        </HydrationBoundary>
      )}
    </div>
  );
}
