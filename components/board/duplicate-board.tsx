"use client";

import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useId, useState } from "react";
import { Button, Input } from "@/components/ui";
import { postJson } from "./board-fetch";

type Props = { boardId: string; name: string; version: number; boardsPath: string };

/** Copies the board under a new name and opens the copy, to try an alternative beside the original. */
export function DuplicateBoard({ boardId, name, version, boardsPath }: Props) {
  const ids = useId();
  const router = useRouter();
  const [copyName, setCopyName] = useState(`${name} (alternative)`.slice(0, 80));
  const mutation = useMutation({
    mutationFn: () => postJson<{ id: string }>(`/api/boards/${encodeURIComponent(boardId)}/duplicate`, { version, name: copyName.trim() }),
    onSuccess: ({ id }) => router.push(`${boardsPath}/${id}`),
  });
  return (
    <details className="group rounded-md border border-line bg-card">
      <summary className="flex min-h-tap cursor-pointer items-center px-4 font-medium text-ink">Try an alternative</summary>
      <form
        className="flex flex-col gap-3 border-t border-line p-4"
        onSubmit={(e) => {
          e.preventDefault();
          mutation.mutate();
        }}
      >
        <label className="flex flex-col gap-1.5" htmlFor={`${ids}-name`}>
          <span className="font-medium text-ink">Name of the copy</span>
          <Input id={`${ids}-name`} value={copyName} onChange={(e) => setCopyName(e.target.value)} maxLength={80} />
        </label>
        {mutation.error && (
          <p role="alert" className="text-problem-ink">
            {mutation.error.message}
          </p>
        )}
        <Button type="submit" variant="secondary" pending={mutation.isPending} className="self-start">
          Duplicate this board
        </Button>
      </form>
    </details>
  );
}
