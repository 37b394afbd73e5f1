/**
 * The caller's network address, as Mottle's own server (scripts/serve.ts) worked it out from the
 * socket and TRUSTED_PROXY_HOPS. The server drops any copy of this header a client sends, so it
 * cannot be forged; without the server (tests calling handlers directly) it is "unknown".
 */
export const CLIENT_ADDRESS_HEADER = "x-mottle-client-address";

export function clientAddress(headers: Headers): string {
  return headers.get(CLIENT_ADDRESS_HEADER) ?? "unknown";
}
