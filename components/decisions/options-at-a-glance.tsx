import { Money, cx, normaliseHex } from "@/components/ui";
import type { OptionView } from "@/lib/decisions/types";
import { taxWords } from "@/lib/pricing/option-price";

/**
 * The options side by side even on a phone: chips, name, price and the difference from the
 * allowance in one row, each linking down to the full option.
 */
export function OptionsAtAGlance({ options, pickedId, taxBasisPoints }: { options: OptionView[]; pickedId: string | null; taxBasisPoints: number }) {
  return (
    <nav aria-label="The options at a glance" className="rounded-lg border border-line bg-card p-3">
      <ul className={cx("grid gap-2", options.length === 2 && "grid-cols-2", options.length === 3 && "grid-cols-3", options.length >= 4 && "grid-cols-4")}>
        {options.map((o) => (
          <li key={o.id}>
            <a
              href={`#option-${o.id}`}
              className={cx(
                "flex h-full min-h-tap flex-col gap-1.5 rounded-md p-1.5 text-sm hover:bg-stone-50",
                pickedId === o.id && "outline-2 outline-offset-0 outline-ink",
              )}
            >
              <span className="flex flex-wrap gap-1" aria-hidden="true">
                {o.lines.slice(0, 3).map((l) => (
                  // A small chip on the same neutral mount as a Swatch; the full swatches are below.
                  <span key={l.id} className="inline-block rounded-chip bg-surround p-1">
                    <span className={cx("block size-8", !normaliseHex(l.hex) && "bg-no-colour")} style={{ backgroundColor: normaliseHex(l.hex) ?? undefined }} />
                  </span>
                ))}
              </span>
              <span className="font-medium leading-snug">{o.label}</span>
              <span className="mt-auto">
                <Money cents={o.priceCents} />
                <span className="block text-ink-soft">
                  {o.comparison.direction === "on" ? "on allowance" : <><Money cents={o.comparison.differenceCents} signed /> {o.comparison.direction}</>}
                </span>
              </span>
            </a>
          </li>
        ))}
      </ul>
      <p className="mt-2 px-1.5 text-sm text-ink-soft">Prices {taxWords(taxBasisPoints)}.</p>
    </nav>
  );
}
