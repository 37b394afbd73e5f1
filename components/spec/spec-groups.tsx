import { groupByRoom, groupBySupplier } from "@/lib/spec/group";
import { SpecLinesTable, type PendingRow, type TableLine } from "./spec-lines-table";
import type { SpecGrouping } from "./view-switch";

type Props = {
  lines: TableLine[];
  pending?: (PendingRow & { room: string })[];
  grouping: SpecGrouping;
  showStatus?: boolean;
  cautionNumbers?: Map<string, number>;
};

/** The schedule as one table per room (open decisions shown in their room) or per supplier. */
export function SpecGroups({ lines, pending = [], grouping, showStatus = true, cautionNumbers }: Props) {
  const groups = grouping === "room" ? groupByRoom(lines) : groupBySupplier(lines);
  const pendingRooms = grouping === "room" ? [...new Set(pending.map((p) => p.room))].filter((r) => !groups.some((g) => g.key === r)) : [];
  return (
    <div className="flex flex-col gap-8">
      {groups.map((group) => (
        <section key={group.key} aria-labelledby={`group-${slug(group.key)}`} className="flex flex-col gap-3 spec-group">
          <h2 id={`group-${slug(group.key)}`} className="font-display text-2xl font-semibold">
            {group.title}
          </h2>
          <SpecLinesTable
            caption={group.title}
            lines={group.lines}
            pending={grouping === "room" ? pending.filter((p) => p.room === group.key) : []}
            showSupplier={grouping === "room"}
            showRoom={grouping === "supplier"}
            showStatus={showStatus}
            cautionNumbers={cautionNumbers}
          />
        </section>
      ))}
      {pendingRooms.map((room) => (
        <section key={room} aria-labelledby={`group-${slug(room)}`} className="flex flex-col gap-3">
          <h2 id={`group-${slug(room)}`} className="font-display text-2xl font-semibold">
            {room}
          </h2>
          <SpecLinesTable caption={room} lines={[]} pending={pending.filter((p) => p.room === room)} showStatus={showStatus} />
        </section>
      ))}
      {grouping === "supplier" && pending.length > 0 && (
        <section aria-labelledby="group-pending" className="flex flex-col gap-3">
          <h2 id="group-pending" className="font-display text-2xl font-semibold">
            Not decided yet
          </h2>
          <SpecLinesTable caption="Not decided yet" lines={[]} pending={pending} showSupplier={false} showRoom showStatus={showStatus} />
        </section>
      )}
    </div>
  );
}

function slug(value: string) {
  return value.toLowerCase().replace(/[^a-z0-9]+/g, "-") || "none";
}
