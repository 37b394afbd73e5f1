import { isDevLike, publicOrigin } from "@/lib/env";

/**
 * The origins a write may come from: the public origin, and outside production the same port on
 * the other loopback names (a developer may open localhost or 127.0.0.1). Another port or host is
 * another site, however close.
 */
function originsFor(origin: string, devLike: boolean): Set<string> {
  const allowed = new Set([origin]);
  const url = new URL(origin);
  if (devLike && ["localhost", "127.0.0.1", "[::1]"].includes(url.hostname)) {
    for (const host of ["localhost", "127.0.0.1", "[::1]"]) allowed.add(`${url.protocol}//${host}${url.port ? `:${url.port}` : ""}`);
  }
  return allowed;
}

export const allowedOrigins: ReadonlySet<string> = originsFor(publicOrigin, isDevLike);
