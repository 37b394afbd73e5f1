import type { Metadata } from "next";
import Link from "next/link";
import { listStudioSuppliers } from "@/db/queries/suppliers";
import { SupplierList } from "@/components/suppliers/supplier-list";
import { cx, EmptyState, LinkButton, PageHeader } from "@/components/ui";
import { requireRole } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Suppliers and trades" };

type Props = { searchParams: Promise<{ archived?: string; deleted?: string }> };

const filterClasses = (on: boolean) =>
  cx("inline-flex min-h-tap items-center rounded-md border px-4", on ? "border-ink bg-ink text-white" : "border-line-strong bg-card text-ink hover:bg-stone-50");

export default async function SuppliersPage({ searchParams }: Props) {
  const actor = await requireRole("designer");
  const { archived, deleted } = await searchParams;
  const withArchived = archived === "1";
  const all = await listStudioSuppliers(actor, { archived: true });
  const shown = withArchived ? all : all.filter((s) => !s.archived);
  const archivedCount = all.length - all.filter((s) => !s.archived).length;
  const add = <LinkButton href="/studio/suppliers/new">Add a supplier</LinkButton>;
  return (
    <div className="space-y-6">
      <PageHeader
        eyebrow={actor.studio?.name}
        title="Suppliers and trades"
        description="The companies you order from and the trades you book, with the people you deal with there."
        actions={all.length > 0 ? add : undefined}
      />
      {deleted && <p role="status" className="rounded-md bg-ok-wash px-3 py-2 text-ok-ink">Supplier deleted.</p>}
      {all.length === 0 ? (
        <EmptyState title="No suppliers yet" action={add}>
          Add the suppliers and trades you order from: the stonemason, the cabinetmaker, the tiler, the electrician. Then your
          finishes can name who supplies them, and specifications and revisions can go to them.
        </EmptyState>
      ) : (
        <>
          {archivedCount > 0 && (
            <nav aria-label="Which suppliers to show" className="flex flex-wrap gap-2">
              <Link href="/studio/suppliers" aria-current={withArchived ? undefined : "page"} className={filterClasses(!withArchived)}>
                Current
              </Link>
              <Link href="/studio/suppliers?archived=1" aria-current={withArchived ? "page" : undefined} className={filterClasses(withArchived)}>
                Including archived ({archivedCount})
              </Link>
            </nav>
          )}
          {shown.length > 0 ? (
            <SupplierList suppliers={shown} />
          ) : (
            <EmptyState title="Every supplier is archived" action={add}>
              Bring one back from the archived list, or add the suppliers and trades you order from now.
            </EmptyState>
          )}
        </>
      )}
    </div>
  );
}
