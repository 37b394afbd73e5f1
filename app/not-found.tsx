import { PublicShell } from "@/components/layout/public-shell";
import { LinkButton } from "@/components/ui";

export default function NotFound() {
  return (
    <PublicShell title="We couldn't find that page" intro="The link may be old, or the page may have moved. Nothing you had is lost.">
      <LinkButton href="/home">Go to your home page</LinkButton>
    </PublicShell>
  );
}
