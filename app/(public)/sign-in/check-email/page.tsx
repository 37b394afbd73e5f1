import type { Metadata } from "next";
import Link from "next/link";
import { PublicShell } from "@/components/layout/public-shell";

export const metadata: Metadata = { title: "Check your e-mail" };

type Props = { searchParams: Promise<{ from?: string }> };

/** Where every link request ends, and every sign-up (?from=sign-up), whether or not the address has an account. */
export default async function CheckEmailPage({ searchParams }: Props) {
  const afterSignUp = (await searchParams).from === "sign-up";
  return (
    <PublicShell
      title={afterSignUp ? "Check your e-mail to finish" : "Check your e-mail"}
      intro={
        afterSignUp
          ? "We've sent a message to the address you gave, with a link to sign in and finish. It works once, for 24 hours."
          : "If that address has a Mottle account, a sign-in link is on its way. It works once, for 24 hours."
      }
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
