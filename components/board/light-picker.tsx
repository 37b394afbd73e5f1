"use client";

import { useId } from "react";
import { cx, Notice } from "@/components/ui";
import { DAYLIGHT, describeLampMethod, LAMP_NOTICE } from "@/lib/boards/lights";
import { LIGHTS } from "@/lib/colour";

type Props = {
  /** The light marked in the picker (the one asked for while it loads). */
  cct: number;
  /** The light whose colours and checks are on screen. */
  shownCct?: number;
  onChange: (cct: number) => void;
  busy?: boolean;
  /** Why the last light asked for is not the one shown. */
  problem?: string | null;
};

/**
 * Which light the board is seen under: native radios, so keys and screen readers just work; under
 * a lamp, what the preview can and cannot show, with the lamp's white point and the method.
 */
export function LightPicker({ cct, shownCct = cct, onChange, busy = false, problem = null }: Props) {
  const name = useId();
  return (
    <div className="flex flex-col gap-3">
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
      <div aria-live="polite" className="flex flex-col gap-3">
        {problem && (
          <Notice tone="problem" title="The light was not changed">
            <span data-light-problem="">{problem}</span>
          </Notice>
        )}
        {shownCct !== DAYLIGHT.cct && (
          <Notice title="What a lamp preview shows">
            <p data-lamp-notice="">{LAMP_NOTICE}</p>
            <p className="mt-1 text-sm" data-lamp-method="">
              {describeLampMethod(shownCct)}
            </p>
          </Notice>
        )}
      </div>
    </div>
  );
}
