import type { Metadata } from "next";
import { listSuppliers } from "@/db/queries/studios";
import { getProjectForStaff, listProjectPeople, listRooms } from "@/db/queries/projects";
import { EditProjectForm } from "@/components/studio/edit-project-form";
import { InviteToProjectForm } from "@/components/studio/invite-to-project-form";
import { ProjectPeople } from "@/components/studio/project-people";
import { ProjectRooms } from "@/components/studio/project-rooms";
import { Card, PageHeader } from "@/components/ui";
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
  const current = suppliers.filter((s) => !s.archivedAt);
  return (
    <div className="space-y-8">
      <PageHeader
        eyebrow="Project"
        title={project.name}
        description={[project.siteAddress, project.installDate ? `Install ${formatDay(project.installDate)}` : "No install date yet"].filter(Boolean).join(" · ")}
      />
      <div className="grid items-start gap-6 lg:grid-cols-2">
        <div className="grid gap-6">
          <Card title="Rooms">
            <ProjectRooms projectId={project.id} rooms={rooms} />
          </Card>
          <Card title="Edit project">
            <EditProjectForm projectId={project.id} name={project.name} siteAddress={project.siteAddress} installDate={project.installDate} />
          </Card>
        </div>
        <Card title="People on this project">
          <ProjectPeople projectId={project.id} people={people} suppliers={current.map((s) => ({ id: s.id, name: s.name }))} />
          <div className="mt-6 border-t border-line pt-6">
            <InviteToProjectForm projectId={project.id} suppliers={current.map((s) => ({ id: s.id, name: s.name, trade: s.trade }))} />
          </div>
        </Card>
      </div>
    </div>
  );
}
