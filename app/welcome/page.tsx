import { listPendingInvitations } from "@/db/queries/invitations";
import { homePathFor } from "@/db/queries/users";
import { PendingInvitations } from "@/components/invitations/pending-invitations";
import { AppShell } from "@/components/layout/app-shell";
import { EmptyState, LinkButton, PageHeader } from "@/components/ui";
import { requireUser } from "@/lib/auth/session";

/**
 * Signed in but on nothing yet, and where an invitation e-mail leads: the invitations waiting for
 * this person, then what happens next instead of an empty screen.
 */
export default async function WelcomePage() {
  const actor = await requireUser();
  const invitations = await listPendingInvitations(actor);
  const home = homePathFor(actor);
  return (
    <AppShell nav={[]} who={actor.email}>
      <div className="space-y-8">
        {invitations.length ? <PageHeader title="Welcome to Mottle" description="A studio has asked you onto a project. Nothing changes until you accept." /> : null}
        <PendingInvitations invitations={invitations} />
        {home !== "/welcome" ? (
          <LinkButton href={home} variant="secondary">
            Go to your projects
          </LinkButton>
        ) : invitations.length === 0 ? (
          <EmptyState title="You're signed in, but not on a project yet">
            When your designer adds you to a project, it appears here. If you expected to see one, ask them to check the
            e-mail address they used: {actor.email}.
          </EmptyState>
        ) : null}
      </div>
    </AppShell>
  );
}
