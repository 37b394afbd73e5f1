import type { Metadata } from "next";
import { emptyDraft } from "@/components/suppliers/supplier-draft";
import { SupplierForm } from "@/components/suppliers/supplier-form";
import { PageHeader } from "@/components/ui";
import { requireRole } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Add a supplier" };

export default async function NewSupplierPage() {
  await requireRole("designer");
  return (
    <div className="space-y-6">
      <PageHeader
        eyebrow="Suppliers and trades"
        title="Add a supplier"
        description="A company you order from or a trade you book. Add the people you deal with there as contacts."
      />
      <div className="max-w-3xl">
        <SupplierForm supplierId={null} initial={emptyDraft()} cancelHref="/studio/suppliers" />
      </div>
    </div>
  );
}
