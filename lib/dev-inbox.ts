import { clientAddress } from "@/lib/client-address";
import { isDevLike } from "@/lib/env";
import { isLoopback } from "@/lib/server/edge";

/**
 * The caught-mail inbox holds everyone's sign-in links, so it answers only outside production and
 * only to a caller on this machine (the address Mottle's server read from the socket).
 */
export function mayReadDevInbox(headers: Headers): boolean {
  return isDevLike && isLoopback(clientAddress(headers));
}
