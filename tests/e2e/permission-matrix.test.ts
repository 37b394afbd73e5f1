import { describe, expect, it } from "vitest";
import { discoverRoutes } from "@/tests/support/app-routes";
import { expectations, FIXTURES, type Outcome } from "@/tests/support/permission-expectations";
import { cookieFor, PERSONA_LABELS, PERSONAS, type MatrixPersona } from "@/tests/support/personas";
import { baseUrl } from "./support/browser";

const secret = process.env.AUTH_SECRET ?? "";

async function outcomeOf(kind: "page" | "api", method: string, path: string, cookie: string | undefined, body: unknown): Promise<Outcome> {
  const headers: Record<string, string> = { origin: baseUrl };
  if (cookie) headers.cookie = cookie;
  if (method !== "GET") headers["content-type"] = "application/json";
  const res = await fetch(baseUrl + path, {
    method,
    headers,
    redirect: "manual",
    body: method === "GET" ? undefined : JSON.stringify(body ?? {}),
  });
  if (kind === "api") return res.status;
  if (res.status === 200) return "ok";
  if (res.status === 404) return "not-found";
  const location = res.headers.get("location") ?? "";
  if (res.status >= 300 && res.status < 400) {
    if (location.includes("/sign-in")) return "sign-in";
    if (location.includes("/forbidden")) return "forbidden";
    return "home";
  }
  return res.status;
}

describe("permission matrix: every page and route handler, as every person", () => {
  const routes = discoverRoutes();

  it("has an expectation for every route found in app/", () => {
    const missing = routes.map((r) => `${r.method} ${r.pattern}`).filter((key) => !expectations[key]);
    expect(missing, `routes with no expectation: add them to tests/support/permission-expectations.ts`).toEqual([]);
  });

  it("answers each person as expected", { timeout: 240_000 }, async () => {
    const cookies = new Map<MatrixPersona, string | undefined>();
    for (const p of PERSONAS) cookies.set(p, await cookieFor(p, secret));
    const failures: string[] = [];
    const table: string[] = [["route", ...PERSONAS.map((p) => PERSONA_LABELS[p])].join(" | ")];
    for (const route of routes) {
      const key = `${route.method} ${route.pattern}`;
      const expectation = expectations[key];
      if (!expectation) continue;
      const cells: string[] = [];
      for (const persona of PERSONAS) {
        const got = await outcomeOf(route.kind, route.method, expectation.path, cookies.get(persona), expectation.body);
        const want = expectation.expect[persona];
        cells.push(got === want ? String(got) : `${got}≠${want}`);
        if (got !== want) failures.push(`${key} as ${PERSONA_LABELS[persona]}: got ${got}, expected ${want}`);
      }
      table.push([key, ...cells].join(" | "));
    }
    console.log(`\nPermission matrix (${routes.length} routes × ${PERSONAS.length} people = ${routes.length * PERSONAS.length} checks)\n${table.join("\n")}\n`);
    expect(failures).toEqual([]);
  });
});

export { FIXTURES };
