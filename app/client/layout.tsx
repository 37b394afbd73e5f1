import type { ReactNode } from "react";
import { AppShell } from "@/components/layout/app-shell";
import { requireRole } from "@/lib/auth/session";

export default async function ClientLayout({ children }: { children: ReactNode }) {
  const actor = await requireRole("client");
  return (
    <AppShell who={actor.name ?? actor.email} nav={[{ href: "/client", label: "My project" }]}>
      {children}
    </AppShell>
  );
}
