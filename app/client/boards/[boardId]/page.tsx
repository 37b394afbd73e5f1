import type { Metadata } from "next";
import { getBoardView } from "@/db/queries/boards";
import { BoardClientView } from "@/components/board/board-client-view";
import { PageHeader } from "@/components/ui";
import { requireRole } from "@/lib/auth/session";
import { pageGuard } from "@/lib/page-guard";

export const metadata: Metadata = { title: "Sample board" };

type Props = { params: Promise<{ boardId: string }> };

export default async function ClientBoardPage({ params }: Props) {
  const { boardId } = await params;
  const actor = await requireRole("client");
  const view = await pageGuard(getBoardView(actor, boardId));
  return (
    <div className="flex flex-col gap-6">
      <PageHeader eyebrow={`${view.project.name} · ${view.room.name}`} title={view.board.name} description="A sample board from your designer." />
      <BoardClientView initial={view} printHref={`/client/boards/${boardId}/print`} />
    </div>
  );
}
