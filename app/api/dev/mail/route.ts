import { NextResponse } from "next/server";
import { env, isDevLike } from "@/lib/env";
import { readCaughtMail } from "@/lib/mail/caught";
import { notFound, route } from "@/lib/http";

export const dynamic = "force-dynamic";

/** Development and demo only: the mail catcher's messages, newest first. In production: 404. */
export const GET = route(async (request: Request) => {
  if (!isDevLike) throw notFound("That page");
  const to = new URL(request.url).searchParams.get("to") ?? undefined;
  const messages = await readCaughtMail(env.MAIL_CATCHER_DIR, { to, limit: 100 });
  return NextResponse.json(
    messages.map(({ to: recipients, subject, text, links, receivedAt }) => ({ to: recipients, subject, text, links, receivedAt })),
  );
});
