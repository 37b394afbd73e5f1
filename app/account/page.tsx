import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { getAccount } from "@/db/queries/account";
import { homePathFor } from "@/db/queries/users";
import { PasswordForm } from "@/components/account/password-form";
import { ProfileForm } from "@/components/account/profile-form";
import { AppShell } from "@/components/layout/app-shell";
import { Card, Notice, PageHeader } from "@/components/ui";
import { requireUser } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Your account" };

/**
 * Everyone's own account: name, phone, and a password. Someone who came in by e-mailed link (an
 * invited designer, most often) is offered "Set a password" first.
 */
export default async function AccountPage() {
  const actor = await requireUser();
  const account = await getAccount(actor.userId);
  if (!account) redirect("/sign-in");
  const home = homePathFor(actor);
  return (
    <AppShell who={actor.name ?? actor.email} nav={[{ href: home, label: home === "/welcome" ? "Home" : "Back to projects" }]}>
      <div className="space-y-8">
        <PageHeader title="Your account" description={`Signed in as ${account.email}.`} />
        {account.hasPassword ? null : (
          <Notice tone="info" title="You don't have a password yet">
            You signed in with an e-mailed link. Set a password to sign in without waiting for one; links keep working too.
          </Notice>
        )}
        <div className="grid items-start gap-6 lg:grid-cols-2">
          <Card title={account.hasPassword ? "Change password" : "Set a password"}>
            <PasswordForm hasPassword={account.hasPassword} />
          </Card>
          <Card title="Your details">
            <ProfileForm name={account.name ?? ""} phone={account.phone ?? ""} staff={actor.studio !== null} />
          </Card>
        </div>
      </div>
    </AppShell>
  );
}
