"use client";

import { useId } from "react";
import { cx } from "@/components/ui";
import { LIGHTS } from "@/lib/colour";

type Props = { cct: number; onChange: (cct: number) => void; busy?: boolean };

/** Which light the board is seen under: native radios, so keys and screen readers just work. */
export function LightPicker({ cct, onChange, busy = false }: Props) {
  const name = useId();
  return (
    <fieldset className="flex flex-col gap-2" aria-busy={busy || undefined}>
      <legend className="mb-2 text-base font-medium text-ink">See it under</legend>
      <div className="grid grid-cols-2 gap-2 sm:flex sm:flex-wrap">
        {LIGHTS.map((light) => {
          const checked = light.cct === cct;
          return (
            <label
              key={light.id}
              className={cx(
                "inline-flex min-h-tap cursor-pointer items-center gap-2 rounded-md border px-3 text-base has-focus-visible:outline-2 has-focus-visible:outline-offset-2 has-focus-visible:outline-focus",
                checked ? "border-ink bg-ink text-white" : "border-line-strong bg-card text-ink hover:bg-stone-50",
              )}
            >
              <input
                type="radio"
                name={name}
                value={light.cct}
                checked={checked}
                onChange={() => onChange(light.cct)}
                className="sr-only"
              />
              {light.label}
            </label>
          );
        })}
      </div>
    </fieldset>
  );
}

