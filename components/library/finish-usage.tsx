import type { FinishUsage } from "@/db/queries/finish-dto";
import { Card } from "@/components/ui";

const lines: [keyof FinishUsage, string, string][] = [
  ["boardItems", "sample board", "sample boards"],
  ["optionLines", "decision option", "decision options"],
  ["fixedItems", "fixed item", "fixed items"],
  ["specLines", "specification line", "specification lines"],
];

export function FinishUsageCard({ usage }: { usage: FinishUsage }) {
  const used = lines.filter(([key]) => usage[key] > 0);
  return (
    <Card title="Where it is used" level={2}>
      {used.length === 0 ? (
        <p className="text-ink-soft">Not used on any board, decision or specification yet.</p>
      ) : (
        <ul className="flex flex-col gap-1">
          {used.map(([key, one, many]) => (
            <li key={key} className="figures">
              {usage[key]} {usage[key] === 1 ? one : many}
            </li>
          ))}
        </ul>
      )}
    </Card>
  );
}
