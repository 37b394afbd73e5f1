import { dehydrate, HydrationBoundary, QueryClient } from "@tanstack/react-query";
import type { Metadata } from "next";
import { listSimilarFinishes } from "@/db/queries/finish-similar";
import { describeRemovalBlock, getFinish } from "@/db/queries/finishes";
import { listActiveSuppliers } from "@/db/queries/suppliers";
import { draftFromFinish } from "@/components/library/finish-draft";
import { FinishForm } from "@/components/library/finish-form";
import { FinishRemoval } from "@/components/library/finish-removal";
import { libraryKeys } from "@/components/library/library-api";
import { FinishUsageCard } from "@/components/library/finish-usage";
import { LrvNotice } from "@/components/library/lrv-flag";
import { SimilarFinishes } from "@/components/library/similar-finishes";
import { LinkButton, Notice, PageHeader } from "@/components/ui";
import { requireRole } from "@/lib/auth/session";
import { pageGuard } from "@/lib/page-guard";
import { finishCategoryLabels } from "@/lib/validation/finish";

export const metadata: Metadata = { title: "Finish" };

type Props = { params: Promise<{ finishId: string }>; searchParams: Promise<{ added?: string }> };

export default async function FinishPage({ params, searchParams }: Props) {
  const actor = await requireRole("designer");
  const { finishId } = await params;
  const finish = await pageGuard(getFinish(actor, finishId));
  const queryClient = new QueryClient();
  const [suppliers] = await Promise.all([
    listActiveSuppliers(actor.studio?.id ?? ""),
    queryClient.prefetchQuery({
      queryKey: libraryKeys.similar(finish.id, 3),
      queryFn: async () => ({ maxDeltaE: 3, anyCategory: false, items: await listSimilarFinishes(actor, finish.id, 3, 24) }),
    }),
  ]);
  const { added } = await searchParams;
  // An archived supplier is offered nowhere new, but a finish that already names it keeps it.
  const supplierOptions = suppliers.map((s) => ({ id: s.id, name: s.name }));
  if (finish.supplierId && finish.supplierName && !supplierOptions.some((s) => s.id === finish.supplierId)) {
    supplierOptions.push({ id: finish.supplierId, name: `${finish.supplierName} (archived)` });
  }
  return (
    <div className="space-y-6">
      <PageHeader
        eyebrow="Library"
        title={finish.name}
        description={[finishCategoryLabels[finish.category], finish.supplierName, finish.productCode].filter(Boolean).join(" · ")}
        actions={
          <LinkButton href="/studio/library" variant="secondary">
            Back to the library
          </LinkButton>
        }
      />
      {added && <p role="status" className="rounded-md bg-ok-wash px-3 py-2 text-ok-ink">Finish added to the library.</p>}
      <LrvNotice finish={finish} />
      {finish.archived && (
        <Notice tone="caution" title="This finish is archived">
          It stays on the boards, decisions and specifications that use it, but isn&apos;t offered for new work.
        </Notice>
      )}
      <div className="grid items-start gap-8 lg:grid-cols-[minmax(0,1fr)_300px]">
        <FinishForm key={finish.id} finishId={finish.id} initial={draftFromFinish(finish)} suppliers={supplierOptions} />
        <aside className="flex flex-col gap-6" aria-label="About this finish">
          <HydrationBoundary state={dehydrate(queryClient)}>
            <SimilarFinishes key={finish.id} finishId={finish.id} category={finishCategoryLabels[finish.category]} leadTimeDays={finish.leadTimeDays} />
          </HydrationBoundary>
          <FinishUsageCard usage={finish.usage} />
          <FinishRemoval finishId={finish.id} archived={finish.archived} removalBlock={describeRemovalBlock(finish.usage)} />
        </aside>
      </div>
    </div>
  );
}
