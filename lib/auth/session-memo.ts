import { LRUCache } from "lru-cache";

/** Auth.js's session cookie, whole or in chunks, plain or with the __Secure- prefix. */
const SESSION_COOKIE = /^(__Secure-)?authjs\.session-token(\.\d+)?$/;

/** The session cookie's value as one string (chunks in order), or null when there is none. */
export function sessionToken(cookies: { name: string; value: string }[]): string | null {
  const parts = cookies.filter((c) => SESSION_COOKIE.test(c.name)).sort((a, b) => a.name.localeCompare(b.name, "en", { numeric: true }));
  return parts.length ? parts.map((c) => `${c.name}=${c.value}`).join(";") : null;
}

/**
 * Remembers who a session cookie belongs to for a few seconds, so a burst of requests decrypts
 * it once instead of each time (Auth.js decrypts the cookie and encrypts a fresh one on every
 * call). Safe because the cookie is sealed: the same string always opens to the same person, and
 * a forged one never reaches the cache. A cookie that expires is honoured at most `ttlMs` longer.
 * No cookie means nobody, without asking Auth.js.
 */
export function createSessionMemo(read: () => Promise<string | null>, ttlMs = 30_000, max = 5000) {
  const seen = new LRUCache<string, { userId: string | null }>({ max, ttl: ttlMs });
  return async function userIdFor(token: string | null): Promise<string | null> {
    if (!token) return null;
    const hit = seen.get(token);
    if (hit) return hit.userId;
    const userId = await read();
    seen.set(token, { userId });
    return userId;
  };
}
