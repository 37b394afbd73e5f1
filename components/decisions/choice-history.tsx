import type { ChoiceView } from "@/lib/decisions/types";
import { When } from "./when";

/** The newest picks first, with who made them and what they said; older ones are counted. */
export function ChoiceHistory({ choices, earlier, viewerId }: { choices: ChoiceView[]; earlier: number; viewerId: string }) {
  if (choices.length === 0) return <p className="text-ink-soft">No picks yet.</p>;
  return (
    <>
      <ol className="divide-y divide-line">
        {choices.map((c) => (
          <li key={c.id} className="py-3">
            <p>
              <span className="font-medium">{c.by.id === viewerId ? "You" : c.by.name}</span> picked “{c.optionLabel}”{" "}
              <span className="text-sm text-ink-soft">
                · <When iso={c.at} />
              </span>
            </p>
            {c.comment && <p className="mt-1 border-l-2 border-line-strong pl-3 text-ink-soft">{c.comment}</p>}
          </li>
        ))}
      </ol>
      {earlier > 0 && (
        <p className="pt-3 text-sm text-ink-soft">…and {earlier === 1 ? "1 earlier pick" : `${earlier} earlier picks`}.</p>
      )}
    </>
  );
}
