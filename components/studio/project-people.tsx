import type { ProjectPerson } from "@/db/queries/projects";
import { Badge, EmptyState } from "@/components/ui";
import { PersonControls } from "./person-controls";

type Props = { projectId: string; people: ProjectPerson[]; suppliers: { id: string; name: string }[] };

/** The project's clients and suppliers' contacts, each with "Change or remove" (or "Withdraw invitation"). */
export function ProjectPeople({ projectId, people, suppliers }: Props) {
  if (people.length === 0) {
    return <EmptyState title="Nobody invited yet">Invite the clients and the suppliers who will order from the specification.</EmptyState>;
  }
  return (
    <ul className="divide-y divide-line">
      {people.map((p) => (
        <li key={p.id} className="flex flex-col gap-2 py-3">
          <div className="flex flex-wrap items-center justify-between gap-2">
            <span>
              {p.name} {p.name !== p.email ? <span className="text-ink-soft">· {p.email}</span> : null}
            </span>
            <span className="flex flex-wrap gap-2">
              <Badge tone="neutral">{p.role === "supplier" ? `Supplier · ${p.supplierName ?? ""}` : "Client"}</Badge>
              {p.joined ? null : <Badge tone="info">Invited, not joined yet</Badge>}
            </span>
          </div>
          <PersonControls projectId={projectId} person={p} suppliers={suppliers} />
        </li>
      ))}
    </ul>
  );
}
