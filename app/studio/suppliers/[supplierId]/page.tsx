import type { Metadata } from "next";
import { getSupplier } from "@/db/queries/suppliers";
import { describeSupplierBlock } from "@/db/queries/supplier-usage";
import { draftFromSupplier } from "@/components/suppliers/supplier-draft";
import { SupplierForm } from "@/components/suppliers/supplier-form";
import { SupplierRemoval } from "@/components/suppliers/supplier-removal";
import { SupplierUsageCard } from "@/components/suppliers/supplier-usage-card";
import { LinkButton, Notice, PageHeader } from "@/components/ui";
import { requireRole } from "@/lib/auth/session";
import { pageGuard } from "@/lib/page-guard";
import { tradeLabel } from "@/lib/suppliers/trades";

export const metadata: Metadata = { title: "Supplier" };

type Props = { params: Promise<{ supplierId: string }>; searchParams: Promise<{ added?: string; saved?: string }> };

export default async function SupplierPage({ params, searchParams }: Props) {
  const actor = await requireRole("designer");
  const { supplierId } = await params;
  const supplier = await pageGuard(getSupplier(actor, supplierId));
  const { added, saved } = await searchParams;
  const contacts = supplier.contacts.length;
  return (
    <div className="space-y-6">
      <PageHeader
        eyebrow="Suppliers and trades"
        title={supplier.name}
        description={[tradeLabel(supplier.trade), contacts === 1 ? "1 contact" : `${contacts} contacts`].join(" · ")}
        actions={
          <LinkButton href="/studio/suppliers" variant="secondary">
            Back to suppliers
          </LinkButton>
        }
      />
      {(added || saved) && (
        <p role="status" className="rounded-md bg-ok-wash px-3 py-2 text-ok-ink">
          {added ? "Supplier added." : "Saved."}
        </p>
      )}
      {supplier.archived && (
        <Notice tone="caution" title="This supplier is archived">
          It stays on the finishes, specifications and projects that name it, but isn&apos;t offered for new work.
        </Notice>
      )}
      <div className="grid items-start gap-8 lg:grid-cols-[minmax(0,1fr)_320px]">
        {/* A new key after each save draws the form again from what was saved (removed contacts gone, a fresh spare row). */}
        <SupplierForm key={saved ?? added ?? "first"} supplierId={supplier.id} initial={draftFromSupplier(supplier)} cancelHref="/studio/suppliers" />
        <aside className="flex flex-col gap-6" aria-label="About this supplier">
          <SupplierUsageCard supplierId={supplier.id} usage={supplier.usage} />
          <SupplierRemoval supplierId={supplier.id} archived={supplier.archived} deleteBlock={describeSupplierBlock(supplier.name, supplier.usage)} />
        </aside>
      </div>
    </div>
  );
}
