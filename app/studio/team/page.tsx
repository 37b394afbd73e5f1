import type { Metadata } from "next";
import { listTeam } from "@/db/queries/studio-invitations";
import { InviteDesignerForm } from "@/components/studio/invite-designer-form";
import { TeamList } from "@/components/studio/team-list";
import { Card, PageHeader } from "@/components/ui";
import { isOwner } from "@/lib/auth/permissions";
import { requireRole } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Team" };

export default async function TeamPage() {
  const actor = await requireRole("designer");
  const team = await listTeam(actor.studio?.id ?? "");
  const owner = isOwner(actor);
  return (
    <div className="space-y-8">
      <PageHeader eyebrow={actor.studio?.name} title="Team" description="The people who keep the library and run projects." />
      <div className="grid items-start gap-6 lg:grid-cols-2">
        <Card title="Studio staff">
          <TeamList team={team} viewerId={actor.userId} owner={owner} />
          {owner ? (
            <p className="mt-4 text-sm text-ink-soft">Someone invited is listed as joined once they sign in and take up the invitation. A studio always keeps at least one owner. To step down, make someone else an owner first; they can then change your role.</p>
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
