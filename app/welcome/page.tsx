import { AppShell } from "@/components/layout/app-shell";
import { EmptyState } from "@/components/ui";
import { requireUser } from "@/lib/auth/session";

/** Signed in but on nothing yet: say what happens next instead of an empty screen. */
export default async function WelcomePage() {
  const actor = await requireUser();
  return (
    <AppShell nav={[]} who={actor.email}>
      <EmptyState title="You're signed in, but not on a project yet">
        When your designer adds you to a project, it appears here. If you expected to see one, ask them to check the
        e-mail address they used: {actor.email}.
      </EmptyState>
    </AppShell>
  );
}
