import { ToneIcon } from "@/components/ui";
import { ShownFigure } from "@/components/ui/shown-figure";
import type { OptionChecks } from "@/lib/decisions/option-checks";

/** The colour checks that matter for one option, worst first, in plain words with the numbers beside them. */
export function OptionChecksList({ checks, boardName }: { checks: OptionChecks; boardName: string | null }) {
  if (checks.source === "none") {
    return <p className="text-sm text-ink-soft">One finish only, so there is nothing to compare it with.</p>;
  }
  const where = checks.source === "board" ? `on the sample board${boardName ? ` “${boardName}”` : ""}` : "with each other";
  if (checks.shown.length === 0) {
    return (
      <p className="flex items-start gap-2 text-sm">
        <ToneIcon tone="ok" className="mt-0.5 text-ok" />
        <span>
          {checks.source === "board"
            ? `All ${checks.checked} surfaces that meet ${where} read as intended.`
            : "These finishes sit well together: each pair reads clearly as a match or as a contrast."}
        </span>
      </p>
    );
  }
  return (
    <div className="space-y-2 text-sm">
      <p className="text-ink-soft">
        Checked {checks.checked} {checks.checked === 1 ? "pair" : "pairs"} {where}. Worth a look:
      </p>
      <ul className="space-y-2">
        {checks.shown.map((c) => (
          <li key={c.between} className="flex items-start gap-2">
            <ToneIcon tone={c.verdict === "fail" ? "problem" : "caution"} className={`mt-0.5 ${c.verdict === "fail" ? "text-problem" : "text-caution"}`} />
            <span>
              <span className="font-medium">{c.between}:</span> {c.reason}{" "}
              <span className="whitespace-nowrap text-stone-600">
                (<ShownFigure value={c.deltaE} text={c.figures.deltaE} unit="ΔE00" />)
              </span>
            </span>
          </li>
        ))}
      </ul>
    </div>
  );
}
