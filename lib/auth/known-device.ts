import { createHmac, timingSafeEqual } from "node:crypto";

/**
 * "This browser has signed in to this account before": a cookie holding, for each of the last
 * few accounts signed in here with a password, an HMAC of the account's e-mail under the server's
 * secret. It says nothing readable (no e-mail in it) and cannot be made up without the secret.
 * It only lifts the per-address sign-in limit for those accounts (db/queries/passwords.ts).
 */
export const KNOWN_DEVICE_COOKIE = "mottle-known-device";
export const KNOWN_DEVICE_MAX_AGE_S = 180 * 24 * 60 * 60;
const MAX_ACCOUNTS = 5;

export function deviceTag(email: string, secret: string): string {
  return createHmac("sha256", secret).update(`known-device:${email}`).digest("base64url").slice(0, 32);
}

function tagsOf(value: string | undefined): string[] {
  return (value ?? "").split(".").filter((tag) => /^[A-Za-z0-9_-]{32}$/.test(tag));
}

export function isKnownDevice(value: string | undefined, email: string, secret: string): boolean {
  const wanted = Buffer.from(deviceTag(email, secret));
  return tagsOf(value).some((tag) => timingSafeEqual(Buffer.from(tag), wanted));
}

/** The cookie's new value after a password sign-in to `email`: that account first, the oldest dropped. */
export function rememberDevice(value: string | undefined, email: string, secret: string): string {
  const tag = deviceTag(email, secret);
  return [tag, ...tagsOf(value).filter((t) => t !== tag)].slice(0, MAX_ACCOUNTS).join(".");
}

/** One cookie's value from a Cookie request header. */
export function cookieValue(header: string | null, name: string): string | undefined {
  for (const part of (header ?? "").split(";")) {
    const at = part.indexOf("=");
    if (at > 0 && part.slice(0, at).trim() === name) return part.slice(at + 1).trim();
  }
  return undefined;
}
