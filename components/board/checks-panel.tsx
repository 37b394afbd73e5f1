import { Notice } from "@/components/ui";
import type { BoardView } from "@/lib/boards/types";
import type { CSSProperties } from "react";
import { DAYLIGHT, describeLight, LAMP_CHECKS_NOTE, paintSurround } from "@/lib/boards/lights";
import { VERDICT_WORDS } from "@/lib/boards/words";
import { CheckCard } from "./check-card";

type Props = {
  view: BoardView;
  chosenPairId: string | null;
  onChoose?: (pairId: string) => void;
};

/** Every pair's check, worst first, with the cautions that always go with judging colour on screen. */
export function ChecksPanel({ view, chosenPairId, onChoose }: Props) {
  const items = new Map(view.items.map((i) => [i.id, i]));
  const { fail, borderline, pass } = view.counts;
  return (
    <section
      aria-labelledby="checks-title"
      className="flex flex-col gap-4 lg:sticky lg:top-4 lg:max-h-[calc(100dvh-2rem)]"
      // The chips' surround is painted under the same light as the chips.
      style={{ "--color-surround": paintSurround(view.light.cct) } as CSSProperties}
    >
      <div className="flex flex-col gap-1">
        <h2 id="checks-title" className="font-display text-2xl font-semibold text-ink">
          Checks
        </h2>
        <p className="text-ink-soft" aria-live="polite">
          {describeLight(view.light, true)}: {fail} {VERDICT_WORDS.fail.toLowerCase()}
          {fail === 1 ? "" : "s"}, {borderline} to look at closely, {pass} working as meant.
        </p>
      </div>
      <Notice tone="caution" title="Screens are not samples">
        <p>{view.cautions.screen}</p>
        <p className="mt-1">{view.cautions.access}</p>
      </Notice>
      {view.light.cct !== DAYLIGHT.cct && (
        <p className="text-sm text-ink-soft" data-lamp-checks="">
          {LAMP_CHECKS_NOTE}
        </p>
      )}
      {view.settingsIgnored && (
        <Notice tone="caution">The studio&apos;s own check settings contradict each other, so these checks use the standard thresholds.</Notice>
      )}
      {view.checks.length === 0 ? (
        <p className="rounded-md border border-dashed border-line-strong p-4 text-ink-soft">
          No pairs yet. Mark where two finishes meet and each pair is checked here.
        </p>
      ) : (
        <ol className="flex min-h-0 flex-col gap-3 lg:-mr-2 lg:overflow-y-auto lg:pr-2" aria-label="Pairs, worst first" tabIndex={0}>
          {view.checks.map((check) => {
            const a = items.get(check.itemAId);
            const b = items.get(check.itemBId);
            if (!a || !b) return null;
            return <CheckCard key={check.pairId} check={check} a={a} b={b} chosen={check.pairId === chosenPairId} onChoose={onChoose} />;
          })}
        </ol>
      )}
    </section>
  );
}
