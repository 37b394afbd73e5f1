import autocannon from "autocannon";
import { gzipSync } from "node:zlib";
import type { BenchRow } from "./table";

type Load = { rps: number; p99: number; errors: number; ok: number };

/** One autocannon run: requests per second, p99 latency, and everything that wasn't a 2xx. */
export async function measureLoad(
  url: string,
  connections: number,
  options: { cookie?: string; method?: "GET" | "POST"; bodies?: string[]; seconds?: number } = {},
): Promise<Load> {
  // Several bodies are sent in turn on each connection (a client going back and forth between two options).
  const result = await autocannon({
    url,
    connections,
    duration: options.seconds ?? 8,
    method: options.method ?? "GET",
    headers: {
      ...(options.cookie ? { cookie: options.cookie } : {}),
      ...(options.bodies ? { "content-type": "application/json" } : {}),
    },
    requests: options.bodies?.map((body) => ({ method: options.method ?? "GET", body })),
  });
  return { rps: result.requests.average, p99: result.latency.p99, errors: result.errors + result.timeouts + result.non2xx, ok: result["2xx"] };
}

const fmt = (n: number, digits = 0) => n.toFixed(digits);

/**
 * `targeted`: the issue sets its targets for the board JSON; the finish table is held to the same
 * ones. A client's choice is a write that e-mails the studio: it is measured and reported.
 */
export function rowsForEndpoint(name: string, at50: Load, at10: Load, base50: Load, targeted = true): BenchRow[] {
  const ratio = at50.rps / base50.rps;
  if (!targeted) {
    return [
      { measure: `${name}: req/s at 50 connections (errors)`, ours: `${fmt(at50.rps)} (${at50.errors})`, baseline: `${fmt(base50.rps)} (${base50.errors})`, ratio: `${fmt(ratio, 2)}×`, target: "reported (a write + e-mail)", met: "–" },
      { measure: `${name}: p99 at 10 connections`, ours: `${fmt(at10.p99)} ms`, baseline: "–", ratio: "–", target: "reported", met: "–" },
    ];
  }
  return [
    {
      measure: `${name}: req/s at 50 connections (errors)`,
      ours: `${fmt(at50.rps)} (${at50.errors})`,
      baseline: `${fmt(base50.rps)} (${base50.errors})`,
      ratio: `${fmt(ratio, 2)}×`,
      target: "≥ 0.5× baseline, 0 errors",
      met: ratio >= 0.5 && at50.errors === 0 ? "yes" : "no",
    },
    {
      measure: `${name}: p99 at 10 connections`,
      ours: `${fmt(at10.p99)} ms`,
      baseline: "–",
      ratio: "–",
      target: "≤ 50 ms",
      met: at10.p99 <= 50 && at10.errors === 0 ? "yes" : "no",
    },
  ];
}

/** First-load JavaScript of a page: the gzip size of every script its HTML loads. */
export async function measurePageJs(base: string, path: string, cookie?: string): Promise<number> {
  const html = await (await fetch(base + path, { headers: cookie ? { cookie } : {} })).text();
  const sources = [...html.matchAll(/<script[^>]+src="([^"]+)"/g)].map((m) => m[1] ?? "");
  let bytes = 0;
  for (const src of new Set(sources)) {
    const body = Buffer.from(await (await fetch(new URL(src, base))).arrayBuffer());
    bytes += gzipSync(body).length;
  }
  return bytes;
}
