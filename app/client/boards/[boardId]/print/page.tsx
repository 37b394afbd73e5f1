import type { Metadata } from "next";
import { getBoardView } from "@/db/queries/boards";
import { BoardPrint } from "@/components/board/board-print";
import { LinkButton } from "@/components/ui";
import { requireRole } from "@/lib/auth/session";
import { lightFromParam } from "@/lib/boards/lights";
import { pageGuard } from "@/lib/page-guard";

export const metadata: Metadata = { title: "Sample board: print" };

type Props = { params: Promise<{ boardId: string }>; searchParams: Promise<{ cct?: string }> };

export default async function ClientBoardPrintPage({ params, searchParams }: Props) {
  const { boardId } = await params;
  const { cct } = await searchParams;
  const actor = await requireRole("client");
  const view = await pageGuard(getBoardView(actor, boardId, lightFromParam(cct)));
  return (
    <BoardPrint
      view={view}
      actions={
        <LinkButton href={`/client/boards/${boardId}`} variant="quiet">
          Back to the board
        </LinkButton>
      }
    />
  );
}
