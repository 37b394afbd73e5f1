import type { ReactNode } from "react";
import { getProjectForStaff } from "@/db/queries/projects";
import { ProjectNav } from "@/components/studio/project-nav";
import { requireRole } from "@/lib/auth/session";
import { pageGuard } from "@/lib/page-guard";

type Props = { children: ReactNode; params: Promise<{ projectId: string }> };

/** Every project page: the project's name and its tabs. Pages still check access themselves. */
export default async function ProjectLayout({ children, params }: Props) {
  const { projectId } = await params;
  const actor = await requireRole("designer");
  const project = await pageGuard(getProjectForStaff(actor, projectId));
  return (
    <div>
      <p className="no-print mb-2 text-sm text-ink-soft">{project.name}</p>
      <ProjectNav projectId={project.id} />
      {children}
    </div>
  );
}
