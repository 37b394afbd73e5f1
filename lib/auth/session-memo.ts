import { LRUCache } from "lru-cache";

/** Auth.js's session cookie, whole or in chunks, plain or with the __Secure- prefix. */
const SESSION_COOKIE = /^(__Secure-)?authjs\.session-token(\.\d+)?$/;

/** The session cookie's value as one string (chunks in order), or null when there is none. */
export function sessionToken(cookies: { name: string; value: string }[]): string | null {
  const parts = cookies.filter((c) => SESSION_COOKIE.test(c.name)).sort((a, b) => a.name.localeCompare(b.name, "en", { numeric: true }));
  return parts.length ? parts.map((c) => `${c.name}=${c.value}`).join(";") : null;
}

/** What a session cookie opens to: the person and the session version it was sealed with. */
export type SessionClaims = { userId: string; sessionVersion: number };

/**
 * Remembers what a session cookie opens to for a few seconds, so a burst of requests decrypts
 * it once instead of each time (Auth.js decrypts the cookie and encrypts a fresh one on every
 * call). Safe because the cookie is sealed: the same string always opens to the same claims, and
 * a forged one never reaches the cache. It remembers the claims, not a verdict: every request
 * still compares the claimed session version with the person's current one (session.ts), so an
 * ended session stops at once. A cookie that expires is honoured at most `ttlMs` longer.
 * No cookie means nobody, without asking Auth.js.
 */
export function createSessionMemo(read: () => Promise<SessionClaims | null>, ttlMs = 30_000, max = 5000) {
  const seen = new LRUCache<string, { claims: SessionClaims | null }>({ max, ttl: ttlMs });
  return async function claimsFor(token: string | null): Promise<SessionClaims | null> {
    if (!token) return null;
    const hit = seen.get(token);
    if (hit) return hit.claims;
    const claims = await read();
    seen.set(token, { claims });
    return claims;
  };
}

/** Whether a session still stands: its person exists and it was sealed with their current version. */
export function isSessionCurrent(claims: SessionClaims | null, current: { sessionVersion: number } | null): boolean {
  return Boolean(claims && current && Number.isInteger(claims.sessionVersion) && claims.sessionVersion === current.sessionVersion);
}
