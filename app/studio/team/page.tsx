import type { Metadata } from "next";
import { listStaff } from "@/db/queries/studios";
import { InviteDesignerForm } from "@/components/studio/invite-designer-form";
import { StaffControls } from "@/components/studio/staff-controls";
import { Badge, Card, PageHeader } from "@/components/ui";
import { isOwner } from "@/lib/auth/permissions";
import { requireRole } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Team" };

export default async function TeamPage() {
  const actor = await requireRole("designer");
  const staff = await listStaff(actor.studio?.id ?? "");
  const owner = isOwner(actor);
  return (
    <div className="space-y-8">
      <PageHeader eyebrow={actor.studio?.name} title="Team" description="The people who keep the library and run projects." />
      <div className="grid items-start gap-6 lg:grid-cols-2">
        <Card title="Studio staff">
          <ul className="divide-y divide-line">
            {staff.map((s) => (
              <li key={s.userId} className="flex flex-col gap-2 py-3">
                <div className="flex flex-wrap items-center justify-between gap-2">
                  <span>
                    {s.name ?? s.email} <span className="text-ink-soft">· {s.email}</span>
                    {s.userId === actor.userId ? <span className="text-ink-soft"> (you)</span> : null}
                  </span>
                  <Badge tone="neutral">{s.role === "owner" ? "Owner" : "Designer"}</Badge>
                </div>
                {owner && s.userId !== actor.userId ? <StaffControls person={{ userId: s.userId, name: s.name ?? s.email, role: s.role }} /> : null}
              </li>
            ))}
          </ul>
          {owner ? (
            <p className="mt-4 text-sm text-ink-soft">A studio always keeps at least one owner. To step down, make someone else an owner first; they can then change your role.</p>
          ) : null}
        </Card>
        {owner ? (
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
