import { Notice } from "@/components/ui";
import { GUIDANCE_ONLY } from "@/lib/cautions";
import type { CautionNote } from "@/lib/spec/caution-notes";

/** The full texts of the cautions a schedule's lines carry, numbered, with the guidance-only note. */
export function CautionNotes({ notes, level = 2 }: { notes: CautionNote[]; level?: 2 | 3 }) {
  if (notes.length === 0) return null;
  const Heading = level === 2 ? "h2" : "h3";
  return (
    <section aria-labelledby="spec-cautions" className="flex flex-col gap-3 spec-cautions">
      <Heading id="spec-cautions" className="font-display text-xl font-semibold">
        Cautions
      </Heading>
      <ol className="flex flex-col gap-3">
        {notes.map((c, i) => (
          <li key={c.key}>
            <Notice tone="caution" title={`${i + 1}. ${c.title}`}>
              {c.text}
            </Notice>
          </li>
        ))}
      </ol>
      <p className="text-sm text-ink-soft">{GUIDANCE_ONLY}</p>
    </section>
  );
}
