"use client";

import type { CSSProperties } from "react";
import { LinkButton, Notice, Swatch } from "@/components/ui";
import { DAYLIGHT, describeLight, paintSurround } from "@/lib/boards/lights";
import type { BoardView } from "@/lib/boards/types";
import { BoardPicture } from "./board-picture";
import { ClientCheck } from "./client-check";
import { LightPicker } from "./light-picker";
import { useBoardUnderLight } from "./use-board";

/** The homeowner's board: to look at under different lights, with the checks in plain words. */
export function BoardClientView({ initial, printHref }: { initial: BoardView; printHref: string }) {
  const light = useBoardUnderLight(initial.board.id, initial);
  const view = light.view;
  const items = new Map(view.items.map((i) => [i.id, i]));
  const daylight = view.light.cct === DAYLIGHT.cct;
  return (
    // The surround (bg-surround) is painted under the same light as the swatches on it.
    <div className="flex flex-col gap-6" style={{ "--color-surround": paintSurround(view.light.cct) } as CSSProperties}>
      <Notice tone="caution" title="About colours on screen">
        {view.cautions.screen}
      </Notice>
      <LightPicker cct={light.pickedCct} shownCct={view.light.cct} onChange={light.chooseLight} busy={light.busy} problem={light.lightProblem} />
      <BoardPicture items={view.items} daylight={daylight} title={`The ${view.board.name} board ${describeLight(view.light)}`} />
      <section aria-labelledby="meet-title" className="flex flex-col gap-3">
        <h2 id="meet-title" className="font-display text-2xl font-semibold text-ink">
          Where finishes meet
        </h2>
        {view.checks.length === 0 ? (
          <p className="text-ink-soft">Your designer has not marked any meeting surfaces on this board yet.</p>
        ) : (
          <ol className="flex flex-col gap-3">
            {view.checks.map((check) => {
              const a = items.get(check.itemAId);
              const b = items.get(check.itemBId);
              return a && b ? <ClientCheck key={check.pairId} check={check} a={a} b={b} /> : null;
            })}
          </ol>
        )}
      </section>
      <section aria-labelledby="finishes-title" className="flex flex-col gap-3">
        <h2 id="finishes-title" className="font-display text-2xl font-semibold text-ink">
          Finishes on this board
        </h2>
        <ul className="grid grid-cols-2 gap-4 sm:grid-cols-3">
          {view.items.map((item) => (
            <li key={item.id} className="flex flex-col gap-1">
              <span className="text-sm font-semibold uppercase tracking-[0.06em] text-stone-600">{item.label}</span>
              <Swatch
                hex={item.finish.tint}
                imageUrl={daylight ? item.finish.imageUrl : null}
                name={item.finish.name}
                productCode={item.finish.productCode}
                lrv={item.finish.lrv}
                lrvSource={item.finish.lrvSource}
              />
            </li>
          ))}
        </ul>
      </section>
      <Notice title="Access is guidance">{view.cautions.access}</Notice>
      <LinkButton href={printHref} variant="secondary" size="lg" className="self-start">
        Print this board
      </LinkButton>
    </div>
  );
}
