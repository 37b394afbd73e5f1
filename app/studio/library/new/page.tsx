import type { Metadata } from "next";
import { listActiveSuppliers } from "@/db/queries/suppliers";
import { emptyDraft } from "@/components/library/finish-draft";
import { FinishForm } from "@/components/library/finish-form";
import { PageHeader } from "@/components/ui";
import { requireRole } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Add a finish" };

export default async function NewFinishPage() {
  const actor = await requireRole("designer");
  const suppliers = await listActiveSuppliers(actor.studio?.id ?? "");
  return (
    <div className="space-y-6">
      <PageHeader
        eyebrow="Library"
        title="Add a finish"
        description="Its colour can come from the maker's published figures or from a sample photo; you choose which to keep."
      />
      <FinishForm finishId={null} initial={emptyDraft} suppliers={suppliers.map((s) => ({ id: s.id, name: s.name }))} />
    </div>
  );
}
