import { Badge, formatLrv } from "@/components/ui";
import { ShownFigure } from "@/components/ui/shown-figure";
import type { BoardCheck } from "@/lib/boards/board-checks";
import type { BoardItemView } from "@/lib/boards/types";
import { INTENT_WORDS, VERDICT_TONE, VERDICT_WORDS } from "@/lib/boards/words";

function Chip({ item }: { item: BoardItemView }) {
  return (
    <span className="shrink-0 rounded-chip bg-surround p-1" aria-hidden="true">
      <span className="block size-9" data-swatch-colour="" style={{ backgroundColor: item.finish.tint }} />
    </span>
  );
}

/** One meeting of two finishes for the homeowner: the verdict in words first, numbers on request. */
export function ClientCheck({ check, a, b }: { check: BoardCheck; a: BoardItemView; b: BoardItemView }) {
  return (
    <li className="flex flex-col gap-3 rounded-lg border border-line bg-card p-4" data-verdict={check.verdict}>
      <div className="flex items-center gap-2">
        <Chip item={a} />
        <Chip item={b} />
        <h3 className="min-w-0 text-lg font-semibold leading-snug text-ink">
          {a.label} and {b.label}
        </h3>
      </div>
      <div>
        <Badge tone={VERDICT_TONE[check.verdict]}>{VERDICT_WORDS[check.verdict]}</Badge>
      </div>
      <p className="text-ink">
        {INTENT_WORDS[check.intent]}
        {check.accessRelevant ? ", and it matters for getting around safely" : ""}. {check.reason}
      </p>
      <details className="rounded-md bg-stone-50">
        <summary className="flex min-h-tap cursor-pointer items-center px-3 text-ink">The numbers</summary>
        <dl className="grid grid-cols-2 gap-x-4 gap-y-2 px-3 pb-3 figures">
          <dt className="text-stone-600">Colour difference</dt>
          <dd>
            <ShownFigure value={check.deltaE} text={check.figures.deltaE} unit="ΔE00" />
          </dd>
          <dt className="text-stone-600">Light reflectance</dt>
          <dd>
            LRV {formatLrv(check.lrvA)} and {formatLrv(check.lrvB)}
          </dd>
          <dt className="text-stone-600">Luminance contrast</dt>
          <dd>
            <ShownFigure value={check.luminanceContrast} text={check.figures.luminanceContrast} unit="%" />
          </dd>
          <dt className="text-stone-600">WCAG contrast</dt>
          <dd>
            <ShownFigure value={check.contrastRatio} text={`${check.figures.contrastRatio}:1`} />
          </dd>
        </dl>
      </details>
    </li>
  );
}
