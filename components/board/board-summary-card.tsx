import Link from "next/link";
import { Badge } from "@/components/ui";
import type { BoardSummary } from "@/lib/boards/types";
import { DuplicateButton } from "./duplicate-button";

/** One board in the list: a strip of its largest finishes, what it holds, and how its checks stand. */
export function BoardSummaryCard({ board, boardsPath }: { board: BoardSummary; boardsPath: string }) {
  const { fail, borderline } = board.counts;
  return (
    <li className="flex flex-col gap-3 rounded-lg border border-line bg-card p-4 shadow-card">
      <div className="flex gap-1 rounded-chip bg-surround p-2" aria-hidden="true">
        {board.preview.length === 0 ? (
          <span className="block h-10 flex-1" />
        ) : (
          board.preview.map((colour, i) => <span key={i} className="block h-10 flex-1" data-swatch-colour="" style={{ backgroundColor: colour }} />)
        )}
      </div>
      <Link href={`${boardsPath}/${board.id}`} className="text-lg font-medium text-ink underline-offset-4 hover:underline">
        {board.name}
      </Link>
      <p className="figures text-sm text-stone-600">
        {board.itemCount} swatch{board.itemCount === 1 ? "" : "es"} · {board.pairCount} pair{board.pairCount === 1 ? "" : "s"} checked
      </p>
      <div className="flex flex-wrap gap-2">
        {fail > 0 && <Badge tone="problem">{fail === 1 ? "1 problem" : `${fail} problems`}</Badge>}
        {borderline > 0 && <Badge tone="caution">{borderline} to look at</Badge>}
        {fail === 0 && borderline === 0 && board.pairCount > 0 && <Badge tone="ok">All pairs work as meant</Badge>}
        {board.pairCount === 0 && <Badge>No pairs marked yet</Badge>}
      </div>
      <DuplicateButton boardId={board.id} name={board.name} version={board.version} boardsPath={boardsPath} />
    </li>
  );
}
