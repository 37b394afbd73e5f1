import { dehydrate, HydrationBoundary, QueryClient } from "@tanstack/react-query";
import type { Metadata } from "next";
import { listFinishes } from "@/db/queries/finish-list";
import { listSuppliers } from "@/db/queries/studios";
import { FinishTable } from "@/components/library/finish-table";
import { libraryKeys } from "@/components/library/library-api";
import { LinkButton, PageHeader } from "@/components/ui";
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
    listSuppliers(studioId),
    queryClient.prefetchQuery({ queryKey: libraryKeys.page(query), queryFn: () => listFinishes(studioId, query) }),
  ]);
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
      <HydrationBoundary state={dehydrate(queryClient)}>
        <FinishTable initialQuery={query} suppliers={suppliers.map((s) => ({ id: s.id, name: s.name }))} />
      </HydrationBoundary>
    </div>
  );
}
