import type { ReactNode } from "react";
import { Badge, cx, formatFigure, lrvText } from "@/components/ui";
import { ShownFigure } from "@/components/ui/shown-figure";
import type { BoardCheck } from "@/lib/boards/board-checks";
import type { BoardItemView } from "@/lib/boards/types";
import { INTENT_WORDS, VERDICT_TONE, VERDICT_WORDS } from "@/lib/boards/words";

type Props = {
  check: BoardCheck;
  a: BoardItemView;
  b: BoardItemView;
  chosen: boolean;
  onChoose?: (pairId: string) => void;
};

function Side({ item }: { item: BoardItemView }) {
  return (
    <span className="flex min-w-0 items-center gap-2">
      <span className="shrink-0 rounded-chip bg-surround p-1" aria-hidden="true">
        <span className="block size-7" data-swatch-colour="" style={{ backgroundColor: item.finish.tint }} />
      </span>
      <span className="flex min-w-0 flex-col leading-tight">
        <span className="truncate font-medium text-ink">{item.label}</span>
        <span className="truncate text-sm text-stone-600">{item.finish.name}</span>
        <span className="figures text-xs text-stone-600">{lrvText(item.finish.lrv, item.finish.lrvSource)}</span>
      </span>
    </span>
  );
}

function Measure({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div className="flex flex-col">
      <dt className="text-xs text-stone-600">{label}</dt>
      <dd className="figures text-base text-ink">{children}</dd>
    </div>
  );
}

/** One pair's check: who meets whom, the verdict in words, the reason and the numbers behind it. */
export function CheckCard({ check, a, b, chosen, onChoose }: Props) {
  return (
    <li
      data-pair-id={check.pairId}
      data-verdict={check.verdict}
      className={cx("flex flex-col gap-3 rounded-md border bg-card p-3", chosen ? "border-ink shadow-[0_0_0_1px_var(--color-ink)]" : "border-line")}
    >
      <div className="flex flex-wrap items-center justify-between gap-2">
        <Badge tone={VERDICT_TONE[check.verdict]}>{VERDICT_WORDS[check.verdict]}</Badge>
        {onChoose && (
          <button
            type="button"
            aria-pressed={chosen}
            onClick={() => onChoose(check.pairId)}
            className="inline-flex min-h-tap items-center justify-center rounded-md border border-line-strong px-3 text-sm text-ink hover:bg-stone-50 aria-pressed:border-ink aria-pressed:bg-ink aria-pressed:text-white"
          >
            {chosen ? "Shown on the board" : "Show on the board"}
            <span className="sr-only">
              : {a.label} and {b.label}
            </span>
          </button>
        )}
      </div>
      <div className="grid grid-cols-2 gap-3">
        <Side item={a} />
        <Side item={b} />
      </div>
      <p className="text-ink">
        <span className="font-medium">
          {INTENT_WORDS[check.intent]}
          {check.accessRelevant && ", matters for access"}.
        </span>{" "}
        {check.reason}
      </p>
      <dl className="grid grid-cols-2 gap-x-4 gap-y-2 sm:grid-cols-4">
        <Measure label="CIEDE2000">
          <ShownFigure value={check.deltaE} text={check.figures.deltaE} unit="ΔE00" />
        </Measure>
        <Measure label="WCAG contrast">
          <ShownFigure value={check.contrastRatio} text={`${check.figures.contrastRatio}:1`} />
        </Measure>
        <Measure label="LRV difference">
          <ShownFigure value={check.lrvDifference} text={check.figures.lrvDifference} unit="points" />
        </Measure>
        <Measure label="Luminance contrast">
          <ShownFigure value={check.luminanceContrast} text={check.figures.luminanceContrast} unit="%" />
        </Measure>
      </dl>
      {check.daylight && (
        <p className={cx("text-sm", check.changed ? "font-medium text-ink" : "text-stone-600")}>
          {check.changed
            ? `Changed under this light: in daylight it was “${VERDICT_WORDS[check.daylight.verdict]}” (${formatFigure(check.daylight.deltaE, 1)} ΔE00).`
            : `Same verdict as in daylight (${formatFigure(check.daylight.deltaE, 1)} ΔE00 there).`}
        </p>
      )}
    </li>
  );
}
