import type { Metadata } from "next";
import { listStaff } from "@/db/queries/studios";
import { InviteDesignerForm } from "@/components/studio/invite-designer-form";
import { Badge, Card, PageHeader } from "@/components/ui";
import { isOwner } from "@/lib/auth/permissions";
import { requireRole } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Team" };

export default async function TeamPage() {
  const actor = await requireRole("designer");
  const staff = await listStaff(actor.studio?.id ?? "");
  return (
    <div className="space-y-8">
      <PageHeader eyebrow={actor.studio?.name} title="Team" description="The people who keep the library and run projects." />
      <div className="grid items-start gap-6 lg:grid-cols-2">
        <Card title="Studio staff">
          <ul className="divide-y divide-line">
            {staff.map((s) => (
              <li key={s.userId} className="flex flex-wrap items-center justify-between gap-2 py-3">
                <span>
                  {s.name ?? s.email} <span className="text-ink-soft">· {s.email}</span>
                </span>
                <Badge tone="neutral">{s.role === "owner" ? "Owner" : "Designer"}</Badge>
              </li>
            ))}
          </ul>
        </Card>
        {isOwner(actor) ? (
          <Card title="Invite a designer">
            <InviteDesignerForm />
          </Card>
        ) : (
          <Card title="Inviting designers">
            <p className="text-ink-soft">Only the studio&apos;s owner can add or remove staff.</p>
          </Card>
        )}
      </div>
    </div>
  );
}
