import type { Metadata } from "next";
import Link from "next/link";
import { PublicShell } from "@/components/layout/public-shell";

export const metadata: Metadata = { title: "Check your e-mail" };

export default function CheckEmailPage() {
  return (
    <PublicShell
      title="Check your e-mail"
      intro="If that address has a Mottle account, a sign-in link is on its way. It works once, for 24 hours."
    >
      <p className="text-ink-soft">
        Nothing after a few minutes? Check your spam folder, or{" "}
        <Link className="underline underline-offset-4" href="/sign-in">
          ask for another link
        </Link>
        .
      </p>
    </PublicShell>
  );
}
