import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { getBoardView } from "@/db/queries/boards";
import { BoardEditor } from "@/components/board/board-editor";
import { LinkButton, PageHeader } from "@/components/ui";
import { requireRole } from "@/lib/auth/session";
import { CATEGORY_OPTIONS } from "@/lib/boards/categories";
import { pageGuard } from "@/lib/page-guard";

export const metadata: Metadata = { title: "Sample board" };

type Props = { params: Promise<{ projectId: string; boardId: string }> };

export default async function BoardPage({ params }: Props) {
  const { projectId, boardId } = await params;
  const actor = await requireRole("designer");
  const view = await pageGuard(getBoardView(actor, boardId));
  if (view.project.id !== projectId || view.access !== "edit") notFound();
  const base = `/studio/projects/${projectId}/boards`;
  return (
    <div className="flex flex-col gap-8">
      <PageHeader
        eyebrow={`Sample board · ${view.room.name}`}
        title={view.board.name}
        actions={
          <>
            <LinkButton href={base} variant="quiet">
              All boards
            </LinkButton>
            <LinkButton href={`${base}/${boardId}/print`} variant="secondary">
              Print view
            </LinkButton>
          </>
        }
      />
      <BoardEditor initial={view} categories={CATEGORY_OPTIONS} boardsPath={base} />
    </div>
  );
}
