import type { Metadata } from "next";
import Link from "next/link";
import { listBoards } from "@/db/queries/boards";
import { BoardSummaryCard } from "@/components/board/board-summary-card";
import { NewBoardForm } from "@/components/board/new-board-form";
import { Card, EmptyState, LinkButton, PageHeader, Section } from "@/components/ui";
import { requireRole } from "@/lib/auth/session";
import { pageGuard } from "@/lib/page-guard";

export const metadata: Metadata = { title: "Sample boards" };

type Props = { params: Promise<{ projectId: string }> };

export default async function BoardsPage({ params }: Props) {
  const { projectId } = await params;
  const actor = await requireRole("designer");
  const list = await pageGuard(listBoards(actor, projectId));
  const base = `/studio/projects/${list.project.id}/boards`;
  const total = list.rooms.reduce((n, r) => n + r.boards.length, 0);
  return (
    <div className="flex flex-col gap-8">
      <PageHeader
        eyebrow={list.project.name}
        title="Sample boards"
        description="One board per idea for a room. Mark where finishes meet and each pair is checked in daylight and under warm or cool light."
      />
      <div className="grid items-start gap-8 lg:grid-cols-[minmax(0,1fr)_20rem]">
        <div className="flex flex-col gap-10">
          {total === 0 && (
            <EmptyState
              title="No boards yet"
              action={
                <LinkButton href="/studio/library" variant="secondary">
                  Open the library
                </LinkButton>
              }
            >
              {list.rooms.length === 0
                ? "Add a room to the project first, then start a board for it and add finishes from your library."
                : "Start a board for a room with the form beside this, then add finishes from your library."}
            </EmptyState>
          )}
          {list.rooms.map((room) => (
            <Section key={room.id} title={room.name} level={2}>
              {room.boards.length === 0 ? (
                <p className="text-ink-soft">No boards for this room yet.</p>
              ) : (
                <ul className="grid gap-4 sm:grid-cols-2">
                  {room.boards.map((board) => (
                    <BoardSummaryCard key={board.id} board={board} boardsPath={base} />
                  ))}
                </ul>
              )}
            </Section>
          ))}
        </div>
        <Card title="Start a board">
          {list.rooms.length === 0 ? (
            <p className="text-ink-soft">
              Add a room on the <Link href={`/studio/projects/${list.project.id}`} className="text-spruce underline underline-offset-4">project page</Link> first.
            </p>
          ) : (
            <NewBoardForm projectId={list.project.id} rooms={list.rooms.map((r) => ({ id: r.id, name: r.name }))} />
          )}
        </Card>
      </div>
    </div>
  );
}
