import type { Metadata } from "next";
import { PublicShell } from "@/components/layout/public-shell";
import { LinkButton } from "@/components/ui";

export const metadata: Metadata = { title: "Not available to you" };

export default function ForbiddenPage() {
  return (
    <PublicShell
      title="This page isn't part of your access"
      intro="You're signed in, but this page belongs to another role or project. If you think you should see it, ask your designer."
    >
      <LinkButton href="/home">Go to your home page</LinkButton>
    </PublicShell>
  );
}
