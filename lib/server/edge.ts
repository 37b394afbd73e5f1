/**
 * What Mottle's own HTTP server (scripts/serve.ts) decides before Next.js sees a request: who is
 * really calling, and the requests no route should ever have to handle. Pure functions, so they
 * can be tested without a server.
 */

/** Headers a client could forge to pose as a proxy's report; dropped unless a proxy is trusted. */
const FORWARDED = ["x-forwarded-for", "x-forwarded-host", "x-forwarded-proto", "x-forwarded-port", "forwarded", "x-real-ip"];

/**
 * The caller's address. With no trusted proxy (hops = 0) it is the socket's peer. Behind `hops`
 * proxies that each append the address they saw to X-Forwarded-For, it is the entry `hops` places
 * from the right of (X-Forwarded-For + the socket's peer): whatever a client wrote further left is
 * ignored. Common practice for X-Forwarded-For (RFC 7239 §5.2 describes the same chain for
 * `Forwarded`).
 */
export function resolveClientAddress(socketAddress: string | undefined, forwardedFor: string | undefined, hops: number): string {
  const peer = normaliseAddress(socketAddress ?? "unknown");
  if (hops <= 0) return peer;
  const chain = [
    ...(forwardedFor ?? "")
      .split(",")
      .map((part) => part.trim())
      .filter(Boolean),
    peer,
  ];
  return normaliseAddress(chain[Math.max(0, chain.length - 1 - hops)] ?? peer);
}

/** IPv4 addresses seen on a dual-stack socket arrive as ::ffff:a.b.c.d. */
function normaliseAddress(address: string): string {
  return address.startsWith("::ffff:") && address.includes(".") ? address.slice(7) : address;
}

export function isLoopback(address: string): boolean {
  return address === "::1" || address.startsWith("127.");
}

/** The forwarded headers to drop before Next reads them (none when a proxy is trusted to set them). */
export function untrustedForwardHeaders(hops: number): string[] {
  return hops > 0 ? [] : FORWARDED;
}

export type EdgeRefusal = { status: number; error: string };

/** The most any request may carry: a photo upload plus its form fields. Larger bodies never reach a route. */
export const MAX_REQUEST_BYTES = 16 * 1024 * 1024;

/** The most JSON any route takes: a board or a decision with every option is a few kilobytes. */
export const MAX_JSON_BYTES = 256 * 1024;

/**
 * Requests refused before routing: a path whose percent-encoding is broken (Next answers those
 * with a 500) and a declared body larger than any route accepts (JSON has the smaller limit).
 */
export function refuseAtEdge(rawUrl: string | undefined, contentLength: string | undefined, contentType?: string): EdgeRefusal | null {
  const path = (rawUrl ?? "/").split("?")[0] ?? "/";
  try {
    decodeURIComponent(path);
  } catch {
    return { status: 400, error: "That address is not valid: it has a broken %-encoding." };
  }
  const json = (contentType ?? "").toLowerCase().startsWith("application/json");
  if (contentLength !== undefined && Number(contentLength) > (json ? MAX_JSON_BYTES : MAX_REQUEST_BYTES)) {
    return { status: 413, error: "That request is too large." };
  }
  return null;
}
