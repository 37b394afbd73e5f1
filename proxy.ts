import { NextResponse, type NextRequest } from "next/server";

/**
 * Early redirects only: the real checks are requireUser/requireRole on every page, action and
 * route. Private pages without a session cookie go to sign-in and come back after it.
 */
const PRIVATE = /^\/(studio|client|supplier|home)(\/|$)/;

export function proxy(request: NextRequest) {
  const { pathname, search } = request.nextUrl;
  const hasSession = request.cookies.getAll().some((c) => c.name.endsWith("authjs.session-token"));
  if (PRIVATE.test(pathname) && !hasSession) {
    const url = new URL("/sign-in", request.url);
    url.searchParams.set("callbackUrl", pathname + search);
    return NextResponse.redirect(url);
  }
  const forwarded = new Headers(request.headers);
  forwarded.set("x-mottle-path", pathname + search);
  return NextResponse.next({ request: { headers: forwarded } });
}

export const config = {
  matcher: ["/((?!api|_next/static|_next/image|favicon.ico|fonts).*)"],
};
