import { Button, Select } from "@/components/ui";
import { activityKinds, type ActivityKind } from "@/lib/activity/kinds";

type Props = { action: string; kind: ActivityKind | null; actorId: string | null; people: { id: string; name: string }[] };

/** Filter by kind and by person: a plain GET form, so it works without JavaScript and the address can be shared. */
export function ActivityFilter({ action, kind, actorId, people }: Props) {
  return (
    <form method="get" action={action} className="flex flex-col gap-3 rounded-lg border border-line bg-card p-4 sm:flex-row sm:items-end">
      <label className="flex flex-1 flex-col gap-1">
        <span className="font-medium">What</span>
        <Select name="kind" defaultValue={kind ?? ""}>
          <option value="">Everything</option>
          {Object.entries(activityKinds).map(([key, k]) => (
            <option key={key} value={key}>
              {k.label}
            </option>
          ))}
        </Select>
      </label>
      <label className="flex flex-1 flex-col gap-1">
        <span className="font-medium">By whom</span>
        <Select name="person" defaultValue={actorId ?? ""}>
          <option value="">Anyone</option>
          {people.map((p) => (
            <option key={p.id} value={p.id}>
              {p.name}
            </option>
          ))}
        </Select>
      </label>
      <Button type="submit" variant="secondary">
        Show
      </Button>
    </form>
  );
}
