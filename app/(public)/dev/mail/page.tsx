import type { Metadata } from "next";
import { headers } from "next/headers";
import { notFound } from "next/navigation";
import { PublicShell } from "@/components/layout/public-shell";
import { EmptyState } from "@/components/ui";
import { mayReadDevInbox } from "@/lib/dev-inbox";
import { env } from "@/lib/env";
import { readCaughtMail } from "@/lib/mail/caught";

export const metadata: Metadata = { title: "Caught mail" };
export const dynamic = "force-dynamic";

/** Development and demo only, and only to this machine: every e-mail the app sent, so a person can click a sign-in link. */
export default async function CaughtMailPage() {
  if (!mayReadDevInbox(await headers())) notFound();
  const messages = await readCaughtMail(env.MAIL_CATCHER_DIR, { limit: 50 });
  return (
    <PublicShell title="Caught mail" intro="Demo and development only: e-mail the app has sent, newest first. Nothing here left this machine.">
      {messages.length === 0 ? (
        <EmptyState title="No mail yet">Ask for a sign-in link and it will appear here.</EmptyState>
      ) : (
        <ol className="space-y-4">
          {messages.map((m) => (
            <li key={m.id} className="rounded-lg border border-line bg-card p-4">
              <p className="text-sm text-ink-soft">
                To {m.to.join(", ")} · <time dateTime={m.receivedAt}>{m.receivedAt.replace("T", " ").slice(0, 19)} UTC</time>
              </p>
              <h2 className="mt-1 font-medium">{m.subject}</h2>
              <ul className="mt-2 space-y-1">
                {m.links.map((link) => (
                  <li key={link}>
                    <a className="break-all underline underline-offset-4" href={link}>
                      {link.includes("/api/auth/callback") ? "Open the sign-in link" : link}
                    </a>
                  </li>
                ))}
              </ul>
            </li>
          ))}
        </ol>
      )}
    </PublicShell>
  );
}
