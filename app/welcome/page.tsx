import { listPendingInvitations } from "@/db/queries/invitations";
import { listMyStudioInvitations } from "@/db/queries/studio-invitations";
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
  const [invitations, studioInvitations] = await Promise.all([listPendingInvitations(actor), listMyStudioInvitations(actor)]);
  const waiting = invitations.length + studioInvitations.length;
  const home = homePathFor(actor);
  return (
    <AppShell nav={[]} who={actor.email}>
      <div className="space-y-8">
        {waiting ? <PageHeader title="Welcome to Mottle" description={studioInvitations.length ? "A studio has invited you. Nothing changes until you accept." : "A studio has asked you onto a project. Nothing changes until you accept."} /> : null}
        <PendingInvitations invitations={invitations} studioInvitations={studioInvitations} />
        {home !== "/welcome" ? (
          <LinkButton href={home} variant="secondary">
            Go to your projects
          </LinkButton>
        ) : waiting === 0 ? (
          <EmptyState title="You're signed in, but not on a project yet">
            When your designer adds you to a project, it appears here. If you expected to see one, ask them to check the
            e-mail address they used: {actor.email}.
          </EmptyState>
        ) : null}
      </div>
    </AppShell>
  );
}
