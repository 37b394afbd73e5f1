"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useCallback, useState } from "react";
import { applyChange, describeRequest, type BoardChange } from "@/lib/boards/changes";
import { DAYLIGHT } from "@/lib/boards/lights";
import type { BoardView } from "@/lib/boards/types";
import { boardKey, BoardRequestError, fetchBoard, sendChange } from "./board-fetch";

export const STALE_MESSAGE =
  "Someone changed this board in another tab or on another screen. We have loaded the latest version, so your last change was not saved: please make it again.";

/** The board under one light; the server page hands over the daylight board so nothing flashes. */
export function useBoard(boardId: string, cct: number, initial: BoardView) {
  return useQuery({
    queryKey: boardKey(boardId, cct),
    queryFn: () => fetchBoard(boardId, cct),
    initialData: cct === DAYLIGHT.cct ? initial : undefined,
    placeholderData: (previous) => previous,
  });
}

/**
 * Board writes, shown at once and sent one at a time. Each carries the version the screen holds
 * when it is sent (after the previous write's answer), so a queue of quick moves never trips over
 * itself, while a change made elsewhere still gets 409: then the board reloads and says so.
 */
export function useBoardChanges(boardId: string, cct: number) {
  const queryClient = useQueryClient();
  const key = boardKey(boardId, cct);
  const [message, setMessage] = useState<string | null>(null);

  const mutation = useMutation({
    mutationKey: ["board-write", boardId],
    scope: { id: `board-${boardId}` },
    mutationFn: async (change: BoardChange) => {
      const current = queryClient.getQueryData<BoardView>(key);
      if (!current) throw new BoardRequestError(409, STALE_MESSAGE);
      return sendChange(describeRequest(boardId, current.board.version, change), cct);
    },
    onMutate: async (change) => {
      await queryClient.cancelQueries({ queryKey: key });
      const previous = queryClient.getQueryData<BoardView>(key);
      if (previous) queryClient.setQueryData<BoardView>(key, applyChange(previous, change, `pending-${crypto.randomUUID()}`));
      setMessage(null);
      return { previous };
    },
    onError: (error, _change, context) => {
      if (error instanceof BoardRequestError && error.status === 409) {
        setMessage(STALE_MESSAGE);
      } else {
        if (context?.previous) queryClient.setQueryData(key, context.previous);
        setMessage(error instanceof Error ? error.message : "That change was not saved. Please try again.");
      }
      void queryClient.invalidateQueries({ queryKey: ["board", boardId] });
    },
    onSuccess: (view) => {
      // While more changes wait their turn, keep their optimistic look and take only the version.
      const waiting = queryClient.isMutating({ mutationKey: ["board-write", boardId] }) > 1;
      queryClient.setQueryData<BoardView>(key, (old) => (waiting && old ? { ...old, board: view.board } : view));
      void queryClient.invalidateQueries({ queryKey: ["board", boardId], predicate: (q) => q.queryKey[2] !== cct, refetchType: "none" });
      void queryClient.invalidateQueries({ queryKey: ["board-list"], refetchType: "none" });
    },
  });

  const { mutate } = mutation;
  const change = useCallback((c: BoardChange) => mutate(c), [mutate]);
  return { change, pending: mutation.isPending, message, clearMessage: () => setMessage(null) };
}
