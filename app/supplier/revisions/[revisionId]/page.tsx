import type { Metadata } from "next";
import { getRevisionView } from "@/db/queries/spec-revision-view";
import { SupplierRevision } from "@/components/spec/supplier/supplier-revision";
import { requireRole } from "@/lib/auth/session";
import { pageGuard } from "@/lib/page-guard";
import { toRevisionJson } from "@/lib/spec/revision-json";

export const metadata: Metadata = { title: "Revision" };

type Props = { params: Promise<{ revisionId: string }> };

/** Phone first: the supplier's own lines of a revision issued to them (404 for anything else). */
export default async function SupplierRevisionPage({ params }: Props) {
  const { revisionId } = await params;
  const actor = await requireRole("supplier");
  const view = await pageGuard(getRevisionView(actor, revisionId));
  return <SupplierRevision initial={toRevisionJson(view)} />;
}
