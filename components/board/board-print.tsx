import type { ReactNode } from "react";
import { Badge, formatLrv, Notice, Table, TBody, Td, Th, THead, Tr } from "@/components/ui";
import { ShownFigure } from "@/components/ui/shown-figure";
import { describeLight } from "@/lib/boards/lights";
import type { BoardView } from "@/lib/boards/types";
import { INTENT_WORDS, VERDICT_TONE, VERDICT_WORDS } from "@/lib/boards/words";
import { BoardPicture } from "./board-picture";
import { PrintButton } from "./print-button";

const SOURCE = { published: "published", photo: "from photo", computed: "computed" } as const;

/** A board on paper: the picture, the schedule of finishes, every check with its numbers, the cautions. */
export function BoardPrint({ view, actions }: { view: BoardView; actions?: ReactNode }) {
  const names = new Map(view.items.map((i) => [i.id, i.label]));
  const daylight = view.checks.every((c) => c.daylight === null);
  return (
    <article className="flex flex-col gap-6">
      <header className="flex flex-col gap-1 border-b border-line pb-4">
        <p className="text-sm font-medium uppercase tracking-[0.08em] text-stone-600">
          {view.project.name} · {view.room.name}
        </p>
        <h1 className="font-display text-3xl font-semibold text-ink">{view.board.name}</h1>
        <p className="text-ink-soft">
          Sample board, version {view.board.version}. Colours shown {describeLight(view.light)}.
        </p>
        <div className="no-print mt-3 flex flex-wrap gap-2">
          <PrintButton />
          {actions}
        </div>
      </header>
      <BoardPicture items={view.items} daylight={daylight} title={`The ${view.board.name} board`} />
      <Table caption="Finishes on this board">
        <THead>
          <Tr>
            <Th>Where</Th>
            <Th>Finish</Th>
            <Th>Code</Th>
            <Th numeric>LRV</Th>
          </Tr>
        </THead>
        <TBody>
          {view.items.map((item) => (
            <Tr key={item.id}>
              <Td className="min-w-36">
                <span className="flex items-center gap-2">
                  <span className="inline-block size-5 shrink-0 border border-stone-400" data-swatch-colour="" style={{ backgroundColor: item.finish.tint }} />
                  {item.label}
                </span>
              </Td>
              <Td className="min-w-36">{item.finish.name}</Td>
              <Td className="figures whitespace-nowrap">{item.finish.productCode ?? "—"}</Td>
              <Td numeric>
                {formatLrv(item.finish.lrv)} <span className="text-stone-600">({SOURCE[item.finish.lrvSource]})</span>
              </Td>
            </Tr>
          ))}
        </TBody>
      </Table>
      <Table caption="Where finishes meet, worst first">
        <THead>
          <Tr>
            <Th>Pair</Th>
            <Th>Verdict</Th>
            <Th numeric>ΔE00</Th>
            <Th numeric>WCAG</Th>
            <Th numeric>LRVs</Th>
            <Th numeric>Luminance contrast</Th>
          </Tr>
        </THead>
        <TBody>
          {view.checks.map((check) => (
            <Tr key={check.pairId}>
              <Td className="min-w-64">
                <span className="font-medium">
                  {names.get(check.itemAId)} and {names.get(check.itemBId)}
                </span>
                <span className="block text-stone-600">
                  {INTENT_WORDS[check.intent]}
                  {check.accessRelevant ? ", matters for access" : ""}
                </span>
                <span className="block">{check.reason}</span>
              </Td>
              <Td>
                <Badge tone={VERDICT_TONE[check.verdict]}>{VERDICT_WORDS[check.verdict]}</Badge>
                {check.changed && check.daylight && <span className="mt-1 block text-stone-600">Daylight: {VERDICT_WORDS[check.daylight.verdict]}</span>}
              </Td>
              <Td numeric>
                <ShownFigure value={check.deltaE} text={check.figures.deltaE} />
              </Td>
              <Td numeric>
                <ShownFigure value={check.contrastRatio} text={`${check.figures.contrastRatio}:1`} />
              </Td>
              <Td numeric>
                {formatLrv(check.lrvA)} / {formatLrv(check.lrvB)}
              </Td>
              <Td numeric>
                <ShownFigure value={check.luminanceContrast} text={check.figures.luminanceContrast} unit="%" />
              </Td>
            </Tr>
          ))}
        </TBody>
      </Table>
      <Notice tone="caution" title="Screens and paper are not samples">
        {view.cautions.screen}
      </Notice>
      <Notice title="Access is guidance">{view.cautions.access}</Notice>
    </article>
  );
}
