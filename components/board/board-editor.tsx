"use client";

import { useState } from "react";
import { Notice } from "@/components/ui";
import { DEFAULT_SIZE, findFreeSpot } from "@/lib/boards/canvas";
import { suggestLabel } from "@/lib/boards/labels";
import { DAYLIGHT } from "@/lib/boards/lights";
import type { BoardView, FinderHit } from "@/lib/boards/types";
import { BoardCanvas } from "./board-canvas";
import { ChecksPanel } from "./checks-panel";
import { DuplicateBoard } from "./duplicate-board";
import { FinishPicker } from "./finish-picker";
import { ItemInspector } from "./item-inspector";
import { LightPicker } from "./light-picker";
import { PairsEditor } from "./pairs-editor";
import { useBoard, useBoardChanges } from "./use-board";

const LAMP_NOTE =
  "Swatches are tinted the way this lamp shifts them against daylight. In the room your eyes adjust and the whole room shifts together, so judge how the finishes change against each other, not the tint itself.";

type Props = {
  initial: BoardView;
  categories: readonly { value: string; label: string }[];
  boardsPath: string;
};

/** The designer's board: canvas and checks side by side, pairs and the finish picker below. */
export function BoardEditor({ initial, categories, boardsPath }: Props) {
  const boardId = initial.board.id;
  const [cct, setCct] = useState<number>(DAYLIGHT.cct);
  const query = useBoard(boardId, cct, initial);
  const { change, message } = useBoardChanges(boardId, cct);
  const view = query.data ?? initial;
  const [selectedId, setSelectedId] = useState<string | null>(null);
  const [chosenPairId, setChosenPairId] = useState<string | null>(null);
  const chosen = view.checks.find((c) => c.pairId === chosenPairId);
  const selected = view.items.find((i) => i.id === selectedId) ?? null;

  function place(hit: FinderHit) {
    const rect = findFreeSpot(view.items, DEFAULT_SIZE.width, DEFAULT_SIZE.height);
    change({ kind: "add", finish: hit, label: suggestLabel(hit.category), rect });
  }

  return (
    <div className="flex flex-col gap-8">
      <p className="sr-only" aria-live="assertive">
        {message}
      </p>
      {message && (
        <Notice tone="problem" title="That change was not saved">
          {message}
        </Notice>
      )}
      <div className="flex flex-col gap-4 sm:flex-row sm:items-end sm:justify-between">
        <div className="flex flex-col gap-2">
          <LightPicker cct={cct} onChange={setCct} busy={query.isFetching} />
          {cct !== DAYLIGHT.cct && <p className="max-w-prose text-sm text-ink-soft">{LAMP_NOTE}</p>}
        </div>
        <div className="sm:w-80">
          <DuplicateBoard boardId={boardId} name={view.board.name} version={view.board.version} boardsPath={boardsPath} />
        </div>
      </div>
      <div className="grid items-start gap-8 lg:grid-cols-[minmax(0,1fr)_23rem]">
        <div className="flex flex-col gap-4">
          <BoardCanvas
            items={view.items}
            editable
            daylight={view.light.cct === DAYLIGHT.cct}
            selectedId={selectedId}
            highlightIds={chosen ? [chosen.itemAId, chosen.itemBId] : []}
            onSelect={setSelectedId}
            onChange={(itemId, rect) => change({ kind: "move", itemId, rect })}
          />
          {view.items.length === 0 && (
            <p className="text-ink-soft">This board is empty. Find a finish below and place it; then drag it where it belongs.</p>
          )}
          {selected && (
            <ItemInspector
              key={`${selected.id}:${selected.label}`}
              item={selected}
              order={view.items.map((i) => i.id)}
              onChange={change}
              onClose={() => setSelectedId(null)}
            />
          )}
        </div>
        <ChecksPanel view={view} chosenPairId={chosenPairId} onChoose={(id) => setChosenPairId((now) => (now === id ? null : id))} />
      </div>
      <div className="grid items-start gap-10 border-t border-line pt-8 lg:grid-cols-2">
        <PairsEditor view={view} onChange={change} />
        <FinishPicker boardId={boardId} categories={categories} onPlace={place} />
      </div>
    </div>
  );
}
