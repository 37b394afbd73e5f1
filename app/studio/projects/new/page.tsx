import type { Metadata } from "next";
import { NewProjectForm } from "@/components/studio/new-project-form";
import { PageHeader } from "@/components/ui";
import { requireRole } from "@/lib/auth/session";

export const metadata: Metadata = { title: "New project" };

export default async function NewProjectPage() {
  await requireRole("designer");
  return (
    <div className="max-w-xl space-y-6">
      <PageHeader title="New project" description="Name it the way your team and client will recognise it." />
      <NewProjectForm />
    </div>
  );
}
