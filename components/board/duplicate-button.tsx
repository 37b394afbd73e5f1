"use client";

import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { Button } from "@/components/ui";
import { postJson } from "./board-fetch";

type Props = { boardId: string; name: string; version: number; boardsPath: string };

/** From the list: copy a board as "… (alternative)" and open the copy. */
export function DuplicateButton({ boardId, name, version, boardsPath }: Props) {
  const router = useRouter();
  const mutation = useMutation({
    mutationFn: () => postJson<{ id: string }>(`/api/boards/${encodeURIComponent(boardId)}/duplicate`, { version, name: `${name} (alternative)`.slice(0, 80) }),
    onSuccess: ({ id }) => router.push(`${boardsPath}/${id}`),
    onError: () => router.refresh(),
  });
  return (
    <div className="flex flex-col gap-1">
      <Button type="button" variant="secondary" pending={mutation.isPending} onClick={() => mutation.mutate()} className="self-start">
        Duplicate<span className="sr-only"> {name}</span>
      </Button>
      {mutation.error && (
        <p role="alert" className="text-sm text-problem-ink">
          {mutation.error.message}
        </p>
      )}
    </div>
  );
}
