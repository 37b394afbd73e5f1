import type { Metadata } from "next";
import Link from "next/link";
import { getFixedItem, listFixedItemChoices } from "@/db/queries/spec-fixed-items";
import { FixedItemForm } from "@/components/spec/fixed-item-form";
import { PageHeader } from "@/components/ui";
import { requireRole } from "@/lib/auth/session";
import { pageGuard } from "@/lib/page-guard";

export const metadata: Metadata = { title: "Change a fixed item" };

type Props = { params: Promise<{ projectId: string; fixedItemId: string }> };

export default async function EditFixedItemPage({ params }: Props) {
  const { projectId, fixedItemId } = await params;
  const actor = await requireRole("designer");
  const [{ item }, { project, rooms, finishes }] = await pageGuard(
    Promise.all([getFixedItem(actor, projectId, fixedItemId), listFixedItemChoices(actor, projectId)]),
  );
  const back = `/studio/projects/${project.id}/specification`;
  return (
    <div className="flex flex-col gap-8">
      <PageHeader
        eyebrow={<Link href={back} className="underline-offset-4 hover:underline">Specification</Link>}
        title={`Change ${item.item}`}
        description="Changes reach the current specification only. Issued revisions keep what they froze; issue a new revision to pass this on."
      />
      <FixedItemForm
        projectId={project.id}
        fixedItemId={item.id}
        rooms={rooms}
        finishes={finishes}
        cancelHref={`${back}#fixed-items`}
        initial={{ roomId: item.roomId, finishId: item.finishId, item: item.item, location: item.location ?? "", quantity: String(item.quantity), unit: item.unit, notes: item.notes ?? "" }}
      />
    </div>
  );
}
