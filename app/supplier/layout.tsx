import type { ReactNode } from "react";
import { AppShell } from "@/components/layout/app-shell";
import { requireRole } from "@/lib/auth/session";

export default async function SupplierLayout({ children }: { children: ReactNode }) {
  const actor = await requireRole("supplier");
  return (
    <AppShell who={actor.name ?? actor.email} nav={[{ href: "/supplier", label: "Issued to me" }]}>
      {children}
    </AppShell>
  );
}
