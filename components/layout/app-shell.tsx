import Link from "next/link";
import type { ReactNode } from "react";
import { Logo } from "@/components/ui";
import { signOutAction } from "@/lib/actions/sign-out";

export type NavItem = { href: string; label: string };

/** Signed-in pages: a plain top bar that wraps on a phone, then the page. */
export function AppShell({ nav, who, children }: { nav: NavItem[]; who: string; children: ReactNode }) {
  return (
    <div className="flex min-h-dvh flex-col">
      <header className="no-print border-b border-line bg-card">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3 sm:px-6">
          <Link href="/home" className="inline-flex rounded-md" aria-label="Mottle home">
            <Logo />
          </Link>
          <nav aria-label="Main" className="order-3 w-full sm:order-none sm:w-auto">
            <ul className="flex flex-wrap gap-1">
              {nav.map((item) => (
                <li key={item.href}>
                  <Link
                    href={item.href}
                    className="inline-flex min-h-11 items-center rounded-md px-3 text-ink hover:bg-stone-100"
                  >
                    {item.label}
                  </Link>
                </li>
              ))}
            </ul>
          </nav>
          <div className="ml-auto flex items-center gap-3">
            <Link
              href="/account"
              className="inline-flex min-h-11 items-center rounded-md px-2 text-sm text-ink-soft underline-offset-4 hover:underline"
            >
              <span className="sm:hidden">Your account</span>
              <span className="hidden sm:inline">
                <span className="sr-only">Your account: </span>
                {who}
              </span>
            </Link>
            <form action={signOutAction}>
              <button
                type="submit"
                className="inline-flex min-h-11 items-center rounded-md px-3 text-ink underline-offset-4 hover:underline"
              >
                Sign out
              </button>
            </form>
          </div>
        </div>
      </header>
      <main id="main" className="mx-auto w-full max-w-6xl flex-1 px-4 py-8 sm:px-6">
        {children}
      </main>
    </div>
  );
}
