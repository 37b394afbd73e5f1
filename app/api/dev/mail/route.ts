import { NextResponse } from "next/server";
import { mayReadDevInbox } from "@/lib/dev-inbox";
import { env } from "@/lib/env";
import { readCaughtMail } from "@/lib/mail/caught";
import { notFound, route } from "@/lib/http";

export const dynamic = "force-dynamic";

/** Development and demo only, and only to this machine: the mail catcher's messages, newest first. Otherwise 404. */
export const GET = route(async (request: Request) => {
  if (!mayReadDevInbox(request.headers)) throw notFound("That page");
  const to = new URL(request.url).searchParams.get("to") ?? undefined;
  const messages = await readCaughtMail(env.MAIL_CATCHER_DIR, { to, limit: 100 });
  return NextResponse.json(
    messages.map(({ to: recipients, subject, text, links, receivedAt }) => ({ to: recipients, subject, text, links, receivedAt })),
  );
});
