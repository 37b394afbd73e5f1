import type { ReactNode } from "react";
import { AppShell } from "@/components/layout/app-shell";
import { requireRole } from "@/lib/auth/session";

export default async function StudioLayout({ children }: { children: ReactNode }) {
  const actor = await requireRole("designer");
  return (
    <AppShell
      who={`${actor.name ?? actor.email} · ${actor.studio?.name ?? ""}`}
      nav={[
        { href: "/studio", label: "Projects" },
        { href: "/studio/library", label: "Library" },
        { href: "/studio/suppliers", label: "Suppliers" },
        { href: "/studio/team", label: "Team" },
        { href: "/studio/settings", label: "Settings" },
      ]}
    >
      {children}
    </AppShell>
  );
}
