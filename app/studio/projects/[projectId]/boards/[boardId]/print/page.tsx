import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { getBoardView } from "@/db/queries/boards";
import { BoardPrint } from "@/components/board/board-print";
import { LinkButton } from "@/components/ui";
import { requireRole } from "@/lib/auth/session";
import { pageGuard } from "@/lib/page-guard";
import { lightFromParam } from "@/lib/boards/lights";

export const metadata: Metadata = { title: "Sample board: print" };

type Props = { params: Promise<{ projectId: string; boardId: string }>; searchParams: Promise<{ cct?: string }> };

export default async function BoardPrintPage({ params, searchParams }: Props) {
  const { projectId, boardId } = await params;
  const { cct } = await searchParams;
  const actor = await requireRole("designer");
  const view = await pageGuard(getBoardView(actor, boardId, lightFromParam(cct)));
  if (view.project.id !== projectId) notFound();
  return (
    <BoardPrint
      view={view}
      actions={
        <LinkButton href={`/studio/projects/${projectId}/boards/${boardId}`} variant="quiet">
          Back to the board
        </LinkButton>
      }
    />
  );
}
