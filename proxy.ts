import { NextResponse, type NextRequest } from "next/server";
import { env } from "@/lib/env";
import { contentSecurityPolicy } from "@/lib/security-headers";

/**
 * Early redirects and the per-request CSP nonce only: the real checks are requireUser/requireRole
 * on every page, action and route. Private pages without a session cookie go to sign-in and come
 * back after it.
 */
const PRIVATE = /^\/(studio|client|supplier|home|account|welcome)(\/|$)/;
const development = env.NODE_ENV !== "production";

export function proxy(request: NextRequest) {
  const { pathname, search } = request.nextUrl;
  const hasSession = request.cookies.getAll().some((c) => c.name.endsWith("authjs.session-token"));
  if (PRIVATE.test(pathname) && !hasSession) {
    const url = new URL("/sign-in", request.url);
    url.searchParams.set("callbackUrl", pathname + search);
    return NextResponse.redirect(url);
  }
  const nonce = Buffer.from(crypto.randomUUID()).toString("base64");
  const csp = contentSecurityPolicy(nonce, development);
  const forwarded = new Headers(request.headers);
  forwarded.set("x-mottle-path", pathname + search);
  forwarded.set("x-nonce", nonce);
  // Next reads the nonce from the request's CSP header and puts it on its own scripts.
  forwarded.set("Content-Security-Policy", csp);
  const response = NextResponse.next({ request: { headers: forwarded } });
  response.headers.set("Content-Security-Policy", csp);
  return response;
}

export const config = {
  matcher: [
    {
      source: "/((?!api|_next/static|_next/image|favicon.ico|fonts).*)",
      missing: [
        { type: "header", key: "next-router-prefetch" },
        { type: "header", key: "purpose", value: "prefetch" },
      ],
    },
  ],
};
