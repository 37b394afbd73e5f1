const PROBE = "http://mottle.invalid";

/**
 * Where to go after sign-in: only a path on this site, so a crafted link can't send someone
 * elsewhere. The value is parsed the way a browser parses it (WHATWG URL: tabs and newlines
 * dropped, backslashes read as slashes, dot segments resolved), so "/\t/evil.example" or
 * "/.//evil.example" — which a browser would follow to another host — fall back to /home.
 */
export function safeCallback(value: string | undefined | null): string {
  if (!value || !value.startsWith("/")) return "/home";
  let url: URL;
  try {
    url = new URL(value, PROBE);
  } catch {
    return "/home";
  }
  if (url.origin !== PROBE) return "/home";
  const path = url.pathname + url.search + url.hash;
  // A path that still starts with two slashes would be read as another host in a Location header.
  if (path.startsWith("//") || path.startsWith("/\\")) return "/home";
  return path;
}
