import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { SignUpForm } from "@/components/auth/sign-up-form";
import { PublicShell } from "@/components/layout/public-shell";
import { currentActor } from "@/lib/auth/session";

export const metadata: Metadata = { title: "Start a studio" };

export default async function SignUpPage() {
  if (await currentActor()) redirect("/home");
  return (
    <PublicShell title="Start your studio on Mottle" intro="You'll be the studio's owner. Invite your designers once you're in.">
      <SignUpForm />
      <p className="text-ink-soft">
        Already have an account?{" "}
        <Link className="underline underline-offset-4" href="/sign-in">
          Sign in
        </Link>
      </p>
    </PublicShell>
  );
}
