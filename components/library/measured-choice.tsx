"use client";

import { formatLrv, Swatch } from "@/components/ui";
import type { Measurement } from "@/lib/uploads/measured";

type Props = {
  measurement: Measurement;
  picked: [number, number, number] | null;
  onPick: (lab: [number, number, number]) => void;
};

const sameLab = (a: readonly number[] | null, b: readonly number[]) => a !== null && a.every((v, i) => v === b[i]);

/** The measured colour and the photo's main colours, to choose the one the finish is kept with. */
export function MeasuredChoice({ measurement, picked, onPick }: Props) {
  const options = [
    {
      key: "measured",
      label: "Measured colour",
      detail: measurement.corrected
        ? `cast and exposure corrected with the ${measurement.cardReflectance ?? "boxed"}% card`
        : "no card: the camera's own exposure and white balance",
      ...measurement.colour,
    },
    ...measurement.palette.map((p, i) => ({
      key: `palette-${i}`,
      label: i === 0 ? "Main colour" : `Colour ${i + 1}`,
      detail: `${Math.round(p.share * 100)}% of the photo`,
      hex: p.hex,
      lab: p.lab,
      lrv: null,
    })),
  ];
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="mb-2 text-base font-medium text-ink">Which colour to keep</legend>
      <ul className="flex flex-col gap-2">
        {options.map((o) => {
          const id = `measured-${o.key}`;
          const on = sameLab(picked, o.lab);
          return (
            <li key={o.key}>
              <label
                htmlFor={id}
                className={`flex cursor-pointer items-center gap-3 rounded-md border p-2 has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-focus ${on ? "border-ink bg-stone-50" : "border-line bg-card"}`}
              >
                <input id={id} type="radio" name="measured-colour" className="sr-only" checked={on} onChange={() => onPick(o.lab)} />
                <Swatch hex={o.hex} name={o.label} size="sm" caption={false} />
                <span className="flex min-w-0 flex-col text-sm leading-snug">
                  <span className="font-medium text-ink">
                    {o.label}
                    {on && <span className="font-semibold"> · kept</span>}
                  </span>
                  <span className="text-stone-600">{o.detail}</span>
                  <span className="figures text-stone-600">
                    {o.hex}
                    {o.lrv !== null && ` · LRV ${formatLrv(o.lrv)}`}
                  </span>
                </span>
              </label>
            </li>
          );
        })}
      </ul>
    </fieldset>
  );
}
