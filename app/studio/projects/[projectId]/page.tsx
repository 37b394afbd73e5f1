import type { Metadata } from "next";
import { listSuppliers } from "@/db/queries/studios";
import { getProjectForStaff, listProjectPeople, listRooms } from "@/db/queries/projects";
import { InviteToProjectForm } from "@/components/studio/invite-to-project-form";
import { Badge, Card, EmptyState, PageHeader } from "@/components/ui";
import { requireRole } from "@/lib/auth/session";
import { formatDay } from "@/lib/format";
import { pageGuard } from "@/lib/page-guard";

export const metadata: Metadata = { title: "Project" };

type Props = { params: Promise<{ projectId: string }> };

export default async function ProjectPage({ params }: Props) {
  const { projectId } = await params;
  const actor = await requireRole("designer");
  const project = await pageGuard(getProjectForStaff(actor, projectId));
  const [rooms, people, suppliers] = await Promise.all([
    listRooms(project.id),
    listProjectPeople(project.id),
    listSuppliers(project.studioId),
  ]);
  return (
    <div className="space-y-8">
      <PageHeader
        eyebrow="Project"
        title={project.name}
        description={[project.siteAddress, `Install ${formatDay(project.installDate)}`].filter(Boolean).join(" · ")}
      />
      <div className="grid items-start gap-6 lg:grid-cols-2">
        <Card title="Rooms">
          {rooms.length === 0 ? (
            <p className="text-ink-soft">No rooms yet.</p>
          ) : (
            <ul className="divide-y divide-line">
              {rooms.map((room) => (
                <li key={room.id} className="py-3">
                  {room.name}
                </li>
              ))}
            </ul>
          )}
        </Card>
        <Card title="People on this project">
          {people.length === 0 ? (
            <EmptyState title="Nobody invited yet">Invite the clients and the suppliers who will order from the specification.</EmptyState>
          ) : (
            <ul className="divide-y divide-line">
              {people.map((p) => (
                <li key={p.id} className="flex flex-wrap items-center justify-between gap-2 py-3">
                  <span>
                    {p.name} {p.name !== p.email ? <span className="text-ink-soft">· {p.email}</span> : null}
                  </span>
                  <span className="flex flex-wrap gap-2">
                    <Badge tone="neutral">{p.role === "supplier" ? `Supplier · ${p.supplierName ?? ""}` : "Client"}</Badge>
                    {p.joined ? null : <Badge tone="info">Invited, not joined yet</Badge>}
                  </span>
                </li>
              ))}
            </ul>
          )}
          <div className="mt-6 border-t border-line pt-6">
            <InviteToProjectForm projectId={project.id} suppliers={suppliers.filter((s) => !s.archivedAt).map((s) => ({ id: s.id, name: s.name, trade: s.trade }))} />
          </div>
        </Card>
      </div>
    </div>
  );
}
