import type { Metadata } from "next";
import Link from "next/link";
import { listFixedItemChoices } from "@/db/queries/spec-fixed-items";
import { FixedItemForm } from "@/components/spec/fixed-item-form";
import { PageHeader } from "@/components/ui";
import { requireRole } from "@/lib/auth/session";
import { pageGuard } from "@/lib/page-guard";

export const metadata: Metadata = { title: "Add a fixed item" };

type Props = { params: Promise<{ projectId: string }> };

export default async function NewFixedItemPage({ params }: Props) {
  const { projectId } = await params;
  const actor = await requireRole("designer");
  const { project, rooms, finishes } = await pageGuard(listFixedItemChoices(actor, projectId));
  const back = `/studio/projects/${project.id}/specification`;
  return (
    <div className="flex flex-col gap-8">
      <PageHeader
        eyebrow={<Link href={back} className="underline-offset-4 hover:underline">Specification</Link>}
        title="Add a fixed item"
        description="Something the specification carries without a client choice. It joins the current specification; suppliers see it once you issue a revision."
      />
      <FixedItemForm projectId={project.id} fixedItemId={null} rooms={rooms} finishes={finishes} cancelHref={back} />
    </div>
  );
}
