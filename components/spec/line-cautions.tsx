import { ToneIcon } from "@/components/ui";
import { cautionNotes } from "@/lib/spec/caution-notes";

/**
 * The cautions a line carries, by title, under the line itself. The full texts and the
 * "guidance only" note are in CautionNotes at the foot of the schedule.
 */
export function LineCautions({ keys, numbers }: { keys: readonly string[]; numbers?: Map<string, number> }) {
  const notes = cautionNotes(keys);
  if (notes.length === 0) return null;
  return (
    <ul className="mt-1.5 flex flex-col gap-0.5 text-sm text-caution-ink" aria-label="Cautions">
      {notes.map((c) => (
        <li key={c.key} className="flex items-start gap-1.5">
          <ToneIcon tone="caution" className="mt-0.5 size-3.5 text-caution" />
          <span>
            {c.title}
            {numbers?.get(c.key) !== undefined && <span className="text-ink-soft"> (note {numbers.get(c.key)})</span>}
          </span>
        </li>
      ))}
    </ul>
  );
}
