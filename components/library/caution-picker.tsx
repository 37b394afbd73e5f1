"use client";

import { Notice } from "@/components/ui";
import { cautionKeys, cautions, GUIDANCE_ONLY } from "@/lib/cautions";

type Props = { selected: string[]; error?: string[]; onChange: (keys: string[]) => void };

/** The one list of cautions (lib/cautions.ts), each with its plain text, to tick the ones that apply. */
export function CautionPicker({ selected, error, onChange }: Props) {
  const toggle = (key: string, on: boolean) => onChange(on ? [...selected, key] : selected.filter((k) => k !== key));
  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="text-base font-medium text-ink">Cautions that apply</legend>
      {error && error.length > 0 && <p className="text-sm font-medium text-problem-ink">{error[0]}</p>}
      <ul className="grid gap-2 lg:grid-cols-2">
        {cautionKeys.map((key) => {
          const id = `caution-${key}`;
          const on = selected.includes(key);
          return (
            <li key={key}>
              <label htmlFor={id} className={`flex h-full min-h-tap cursor-pointer gap-3 rounded-md border p-3 ${on ? "border-caution bg-caution-wash" : "border-line bg-card"}`}>
                <input id={id} type="checkbox" className="mt-1 size-5 shrink-0 accent-[var(--color-caution-ink)]" checked={on} onChange={(e) => toggle(key, e.target.checked)} />
                <span className="flex flex-col gap-1">
                  <span className="font-medium text-ink">{cautions[key].title}</span>
                  <span className="text-sm text-ink-soft">{cautions[key].text}</span>
                </span>
              </label>
            </li>
          );
        })}
      </ul>
      <Notice title="Guidance only">{GUIDANCE_ONLY}</Notice>
    </fieldset>
  );
}
