import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { LinkSignInForm, PasswordSignInForm } from "@/components/auth/sign-in-forms";
import { PublicShell } from "@/components/layout/public-shell";
import { Notice } from "@/components/ui";
import { safeCallback } from "@/lib/auth/callback";
import { currentActor } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Sign in" };

type Props = { searchParams: Promise<{ callbackUrl?: string; error?: string; email?: string }> };

export default async function SignInPage({ searchParams }: Props) {
  const { callbackUrl, error, email } = await searchParams;
  const target = safeCallback(callbackUrl);
  if (await currentActor()) redirect(target);
  return (
    <PublicShell title="Sign in to Mottle" intro="Clients and suppliers: we'll e-mail you a link, no password needed.">
      {error ? (
        <Notice tone="problem" title="That sign-in didn't work">
          {error === "Verification"
            ? "The link has expired or was already used. Ask for a new one below."
            : "Please try again, or ask for a new sign-in link."}
        </Notice>
      ) : null}
      <LinkSignInForm callbackUrl={target} defaultEmail={email} />
      <PasswordSignInForm callbackUrl={target} />
    </PublicShell>
  );
}
