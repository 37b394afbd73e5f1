import { redirect } from "next/navigation";
import { PublicShell } from "@/components/layout/public-shell";
import { LinkButton } from "@/components/ui";
import { currentActor } from "@/lib/auth/session";

export default async function LandingPage() {
  if (await currentActor()) redirect("/home");
  return (
    <PublicShell
      title="From proposed finishes to the list each supplier orders from"
      intro="Mottle keeps a studio's finishes, sample boards, client decisions and specifications in one place, and checks how finishes that sit side by side really differ."
    >
      <div className="flex flex-col gap-3 sm:flex-row">
        <LinkButton href="/sign-in" size="lg">
          Sign in
        </LinkButton>
        <LinkButton href="/sign-up" size="lg" variant="secondary">
          Start a studio
        </LinkButton>
      </div>
    </PublicShell>
  );
}
