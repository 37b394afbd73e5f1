import { request } from "node:http";
import { baseUrl } from "./browser";

/**
 * HTTP requests to the test server from a chosen loopback address (127.0.0.x): on Linux every
 * address in 127.0.0.0/8 is this machine, so a test can be many callers, each of which Mottle's
 * server (scripts/serve.ts) sees by its socket address, whatever headers it sends.
 */
export type Answer = { status: number; headers: Record<string, string | string[] | undefined>; text: string; ms: number };

const server = new URL(baseUrl);

export function fromAddress(localAddress: string, method: string, path: string, headers: Record<string, string> = {}, body?: string): Promise<Answer> {
  return new Promise((resolve, reject) => {
    const started = performance.now();
    const req = request({ host: server.hostname, port: server.port, localAddress, method, path, headers }, (res) => {
      let text = "";
      res.setEncoding("utf8");
      res.on("data", (chunk: string) => (text += chunk));
      res.on("end", () => resolve({ status: res.statusCode ?? 0, headers: res.headers, text, ms: performance.now() - started }));
    });
    req.on("error", reject);
    if (body !== undefined) req.write(body);
    req.end();
  });
}

/** The cookies an answer set, as one Cookie header (name=value pairs only). */
export function cookiesOf(answer: Answer): string {
  return ([] as string[])
    .concat(answer.headers["set-cookie"] ?? [])
    .map((c) => c.split(";")[0] ?? "")
    .join("; ");
}

/**
 * A POST to one of Auth.js's endpoints the way a script would: a CSRF token from GET
 * /api/auth/csrf (its cookie with it), a form body, and our own Origin (route() wants one).
 */
export async function authPost(localAddress: string, path: string, fields: Record<string, string>, extra: Record<string, string> = {}): Promise<Answer> {
  const csrf = await fromAddress(localAddress, "GET", "/api/auth/csrf");
  const { csrfToken } = JSON.parse(csrf.text) as { csrfToken: string };
  const cookie = [cookiesOf(csrf), extra.cookie].filter(Boolean).join("; ");
  return fromAddress(
    localAddress,
    "POST",
    path,
    { ...extra, "content-type": "application/x-www-form-urlencoded", origin: server.origin, cookie },
    new URLSearchParams({ ...fields, csrfToken }).toString(),
  );
}

export function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? (sorted[mid] ?? 0) : ((sorted[mid - 1] ?? 0) + (sorted[mid] ?? 0)) / 2;
}
