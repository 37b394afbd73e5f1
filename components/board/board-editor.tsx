"use client";

import { useState, type CSSProperties } from "react";
import { Notice } from "@/components/ui";
import { DEFAULT_SIZE, findFreeSpot } from "@/lib/boards/canvas";
import { suggestLabel } from "@/lib/boards/labels";
import { DAYLIGHT, paintSurround } from "@/lib/boards/lights";
import type { BoardView, FinderHit } from "@/lib/boards/types";
import { BoardCanvas } from "./board-canvas";
import { ChecksPanel } from "./checks-panel";
import { DuplicateBoard } from "./duplicate-board";
import { FinishPicker } from "./finish-picker";
import { ItemInspector } from "./item-inspector";
import { LightPicker } from "./light-picker";
import { PairsEditor } from "./pairs-editor";
import { useBoardChanges, useBoardUnderLight } from "./use-board";

type Props = {
  initial: BoardView;
  categories: readonly { value: string; label: string }[];
  boardsPath: string;
};

/** The designer's board: canvas and checks side by side, pairs and the finish picker below. */
export function BoardEditor({ initial, categories, boardsPath }: Props) {
  const boardId = initial.board.id;
  const light = useBoardUnderLight(boardId, initial);
  const { change, message } = useBoardChanges(boardId, light.shownCct);
  const view = light.view;
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
          <LightPicker
            cct={light.pickedCct}
            shownCct={view.light.cct}
            onChange={light.chooseLight}
            busy={light.busy}
            problem={light.lightProblem}
          />
        </div>
        <div className="sm:w-80">
          <DuplicateBoard boardId={boardId} name={view.board.name} version={view.board.version} boardsPath={boardsPath} />
        </div>
      </div>
      <div className="grid items-start gap-8 lg:grid-cols-[minmax(0,1fr)_23rem]">
        <div className="flex flex-col gap-4">
          {/* The surround (bg-surround) is painted under the same light as the swatches on it. */}
          <div style={{ "--color-surround": paintSurround(view.light.cct) } as CSSProperties}>
            <BoardCanvas
            items={view.items}
            editable
            daylight={view.light.cct === DAYLIGHT.cct}
            selectedId={selectedId}
            highlightIds={chosen ? [chosen.itemAId, chosen.itemBId] : []}
            onSelect={setSelectedId}
            onChange={(itemId, rect) => change({ kind: "move", itemId, rect })}
            />
          </div>
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
