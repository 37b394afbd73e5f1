"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useCallback, useRef, useState } from "react";
import { applyChange, describeRequest, type BoardChange } from "@/lib/boards/changes";
import { DAYLIGHT, describeLight, findLight } from "@/lib/boards/lights";
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
  });
}

function lightName(cct: number): string {
  const light = findLight(cct) ?? DAYLIGHT;
  return describeLight(light);
}

/**
 * The board and the light it is shown under. A new light is fetched first and shown only once it
 * has arrived: until then the picker marks the light asked for as busy; if the fetch fails the
 * picker goes back to the light still on screen and `lightProblem` says what happened, so the
 * colours and checks on screen are never those of another light than the one marked.
 */
export function useBoardUnderLight(boardId: string, initial: BoardView) {
  const queryClient = useQueryClient();
  const [shown, setShown] = useState<number>(DAYLIGHT.cct);
  const [asked, setAsked] = useState<number | null>(null);
  const [lightProblem, setLightProblem] = useState<string | null>(null);
  const latest = useRef(0);
  const query = useBoard(boardId, shown, initial);

  const chooseLight = useCallback(
    (cct: number) => {
      const ticket = ++latest.current;
      setLightProblem(null);
      if (cct === shown) {
        setAsked(null);
        return;
      }
      setAsked(cct);
      queryClient
        .fetchQuery({ queryKey: boardKey(boardId, cct), queryFn: () => fetchBoard(boardId, cct), staleTime: 0 })
        .then(() => {
          if (ticket !== latest.current) return;
          setShown(cct);
          setAsked(null);
        })
        .catch((error: unknown) => {
          if (ticket !== latest.current) return;
          setAsked(null);
          const why = error instanceof Error && error.message ? ` ${error.message}` : "";
          setLightProblem(`The board could not be loaded ${lightName(cct)}.${why} It is still shown ${lightName(shown)}.`);
        });
    },
    [boardId, queryClient, shown],
  );

  return {
    view: query.data ?? initial,
    /** The light whose colours and checks are on screen. */
    shownCct: shown,
    /** The light the picker marks: the one asked for while it loads, else the one shown. */
    pickedCct: asked ?? shown,
    busy: asked !== null || query.isFetching,
    lightProblem,
    chooseLight,
  };
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
