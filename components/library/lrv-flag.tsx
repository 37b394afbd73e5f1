import { Notice, ToneIcon } from "@/components/ui";
import { checkPublishedLrv, formatAgainst } from "@/lib/colour";
import type { Lab } from "@/lib/colour";

type Recorded = { lab: readonly [number, number, number] | Lab; lrv: number; lrvSource: string; colourSource: string };

/**
 * In the library table and cards: a short flag when a finish's published LRV is more than
 * LRV_DISAGREEMENT_POINTS from the one its colour implies (lib/colour/lrv-check.ts).
 */
export function LrvFlag({ finish, align = "end" }: { finish: Recorded; align?: "start" | "end" }) {
  const check = checkPublishedLrv(finish);
  if (!check?.disagrees) return null;
  return (
    <span className={`mt-0.5 flex items-center gap-1 ${align === "end" ? "justify-end" : ""} text-xs font-medium text-caution-ink`} title={check.note ?? undefined} data-lrv-flag="">
      <ToneIcon tone="caution" className="text-caution" />
      Colour implies {formatAgainst(check.impliedLrv, 0)}
    </span>
  );
}

/** On the finish page: the same disagreement in full, with what to check. */
export function LrvNotice({ finish }: { finish: Recorded }) {
  const check = checkPublishedLrv(finish);
  if (!check?.disagrees) return null;
  return (
    <Notice tone="caution" title="The LRV and the colour disagree">
      {check.note} The access checks use the published LRV until one of them is corrected.
    </Notice>
  );
}
