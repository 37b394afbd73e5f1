import Link from "next/link";
import type { ReactNode } from "react";
import { Logo } from "@/components/ui";

/** Signed-out pages: one narrow column that reads well on a phone. */
export function PublicShell({ title, intro, children }: { title: string; intro?: string; children: ReactNode }) {
  return (
    <div className="flex min-h-dvh flex-col">
      <header className="px-5 py-4">
        <Link href="/" className="inline-flex rounded-md">
          <Logo />
        </Link>
      </header>
      <main id="main" className="mx-auto w-full max-w-md flex-1 space-y-6 px-5 pb-16 pt-6">
        <div className="space-y-2">
          <h1 className="font-display text-3xl leading-tight">{title}</h1>
          {intro ? <p className="text-ink-soft">{intro}</p> : null}
        </div>
        {children}
      </main>
    </div>
  );
}
