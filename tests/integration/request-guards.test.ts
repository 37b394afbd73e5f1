import { createClient } from "@libsql/client";
import { afterAll, describe, expect, it } from "vitest";
import { POST as approve } from "@/app/api/decisions/[decisionId]/approve/route";
import { POST as choose } from "@/app/api/decisions/[decisionId]/choice/route";
import { POST as createFinish } from "@/app/api/finishes/route";
import { GET as viewDecision } from "@/app/api/decisions/[decisionId]/route";
import { MAX_JSON_BYTES } from "@/lib/http";
import { demo } from "@/tests/support/decision-calls";
import { actAs } from "@/tests/support/session";

/**
 * What every write route refuses before it does anything, whoever is signed in: a request that
 * did not come from Mottle's own pages (Origin / Sec-Fetch-Site), a body that is not declared
 * JSON, one too large, one with a NUL in its text. Each refusal writes nothing.
 */
const db = createClient({ url: process.env.DATABASE_URL ?? "" });
afterAll(() => db.close());

const OURS = "http://mottle.test";
const count = async (table: string) => Number((await db.execute(`select count(*) as n from ${table}`)).rows[0]?.n);

type Handler = (request: Request, context: { params: Promise<{ decisionId: string }> }) => Promise<Response>;
async function post(handler: Handler, headers: Record<string, string>, body: string, decisionId = demo.pendant) {
  const res = await handler(new Request("http://mottle.test/api", { method: "POST", headers, body }), { params: Promise.resolve({ decisionId }) });
  return { status: res.status, body: (await res.json()) as { error?: string } };
}

const pick = JSON.stringify({ optionId: "demo-option-kp-brass", comment: "from elsewhere" });

describe("writes from anywhere but Mottle's own pages", () => {
  // Fetch Standard §3.1 (Origin on every non-GET request) and W3C Fetch Metadata (Sec-Fetch-Site).
  it.each<[string, Record<string, string>]>([
    ["no Origin and no Sec-Fetch-Site", {}],
    ["Origin: null (a sandboxed frame or a redirect)", { origin: "null" }],
    ["another port on the same host", { origin: "http://mottle.test:8080" }],
    ["a sibling subdomain", { origin: "http://evil.mottle.test" }],
    ["Sec-Fetch-Site: same-site with our Origin forged by a non-browser", { origin: OURS, "sec-fetch-site": "same-site" }],
    ["Sec-Fetch-Site: cross-site and no Origin", { "sec-fetch-site": "cross-site" }],
  ])("refuses a client's pick with %s (403), and saves nothing", async (_, headers) => {
    actAs("client");
    const before = await count("choice");
    const reply = await post(choose, { "content-type": "application/json", ...headers }, pick);
    expect(reply.status).toBe(403);
    expect(reply.body.error).toMatch(/Mottle's own pages/);
    expect(await count("choice")).toBe(before);
  });

  it("refuses the cross-site text/plain approval a no-cors fetch can send (403 before 415)", async () => {
    actAs("client");
    const reply = await post(approve, { "content-type": "text/plain", origin: "http://mottle.test:4000" }, JSON.stringify({ optionId: "x", confirm: true, version: 1 }));
    expect(reply.status).toBe(403);
    const view = (await (await viewDecision(new Request("http://mottle.test/api"), { params: Promise.resolve({ decisionId: demo.pendant }) })).json()) as { status?: string };
    expect(view.status).not.toBe("locked");
  });

  it("takes our own Origin, or Sec-Fetch-Site: same-origin alone", async () => {
    actAs("designer");
    const finish = (name: string) => JSON.stringify({ name, category: "paint", surface: "matt", hex: "#d8d4cc" });
    const withOrigin = await createFinish(new Request("http://mottle.test/api/finishes", { method: "POST", headers: { "content-type": "application/json", origin: OURS }, body: finish("Guard test A") }), { params: Promise.resolve({}) });
    const withFetchSite = await createFinish(new Request("http://mottle.test/api/finishes", { method: "POST", headers: { "content-type": "application/json", "sec-fetch-site": "same-origin" }, body: finish("Guard test B") }), { params: Promise.resolve({}) });
    expect([withOrigin.status, withFetchSite.status]).not.toContain(403);
  });

  it("saves the same pick when it does come from our pages (so the refusals above are the guard's)", async () => {
    actAs("client");
    const before = await count("choice");
    const reply = await post(choose, { "content-type": "application/json", origin: OURS, "sec-fetch-site": "same-origin" }, pick);
    expect(reply.status).toBe(200);
    expect(await count("choice")).toBe(before + 1);
  });
});

describe("bodies a JSON route will not read", () => {
  it("answers 415 for a body not declared application/json, and saves nothing (RFC 9110 §15.5.16)", async () => {
    actAs("client");
    const before = await count("choice");
    for (const type of ["text/plain", "application/x-www-form-urlencoded", "multipart/form-data; boundary=x", ""]) {
      const reply = await post(choose, { "content-type": type, origin: OURS }, pick);
      expect(reply.status, type).toBe(415);
    }
    expect(await count("choice")).toBe(before);
  });

  it("answers 413 past the JSON limit, declared or streamed (RFC 9110 §15.5.14)", async () => {
    actAs("client");
    const huge = JSON.stringify({ optionId: "demo-option-kp-brass", comment: "x".repeat(MAX_JSON_BYTES) });
    expect((await post(choose, { "content-type": "application/json", origin: OURS }, huge)).status).toBe(413);
    const stream = new ReadableStream<Uint8Array>({
      start(controller) {
        for (let i = 0; i < 64; i++) controller.enqueue(new TextEncoder().encode("x".repeat(16 * 1024)));
        controller.close();
      },
    });
    const request = new Request("http://mottle.test/api", { method: "POST", headers: { "content-type": "application/json", origin: OURS }, body: stream, duplex: "half" } as RequestInit);
    const res = await choose(request, { params: Promise.resolve({ decisionId: demo.pendant }) });
    expect(res.status).toBe(413);
  });

  it("answers 400 for a NUL anywhere in the text, and saves nothing", async () => {
    actAs("client");
    const before = await count("choice");
    const reply = await post(choose, { "content-type": "application/json", origin: OURS }, JSON.stringify({ optionId: "demo-option-kp-brass", comment: "half\u0000hidden" }));
    expect(reply.status).toBe(400);
    expect(reply.body.error).toMatch(/NUL/);
    expect(await count("choice")).toBe(before);
  });
});
