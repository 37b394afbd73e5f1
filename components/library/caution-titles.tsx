import { ToneIcon } from "@/components/ui";
import { cautions, isCautionKey } from "@/lib/cautions";

/** The titles of a finish's cautions, each with the caution mark; the full text is on the finish's page. */
export function CautionTitles({ keys }: { keys: string[] }) {
  const known = keys.filter(isCautionKey);
  if (known.length === 0) return <span className="text-stone-600">None</span>;
  return (
    <ul className="flex flex-col gap-1">
      {known.map((key) => (
        <li key={key} className="flex items-start gap-1.5 text-caution-ink">
          <ToneIcon tone="caution" className="mt-0.5 size-3.5 text-caution" />
          <span>{cautions[key].title}</span>
        </li>
      ))}
    </ul>
  );
}
