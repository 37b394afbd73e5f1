import "server-only";
import { clientAddress } from "@/lib/client-address";
import { env } from "@/lib/env";
import { cookieValue, isKnownDevice, KNOWN_DEVICE_COOKIE } from "./known-device";

/**
 * Who is trying to sign in, as far as limits go: the network address Mottle's own server worked
 * out (never X-Forwarded-For, which the caller writes), and whether this browser has signed in to
 * `email` before. Without the server every caller is "unknown" and shares one set of limits.
 */
export function callerOf(headers: Headers, email: string) {
  return {
    address: clientAddress(headers),
    knownDevice: isKnownDevice(cookieValue(headers.get("cookie"), KNOWN_DEVICE_COOKIE), email, env.AUTH_SECRET),
  };
}
