import { createServer, request as httpRequest, type Server } from "node:http";
import { networkInterfaces } from "node:os";
import { connect } from "node:net";
import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { cookieFor } from "@/tests/support/personas";
import { baseUrl, launch, newPage, signInWithLink, signInWithPassword, snap, waitForMailLink } from "./support/browser";

/**
 * The attacks an outside review carried out against the production build, carried out again.
 * Each test fails if the attack gets through. Forged headers go out over node:http, which (unlike
 * a browser) lets a caller write Host, X-Forwarded-* and Origin as they please.
 */
const secret = process.env.AUTH_SECRET ?? "";
const ours = new URL(baseUrl);
const EVIL = "evil.example";
const FORGED = { host: EVIL, "x-forwarded-host": EVIL, "x-forwarded-proto": "https", origin: `https://${EVIL}` };

type Raw = { status: number; headers: Record<string, string | string[] | undefined>; text: string };

function raw(method: string, path: string, headers: Record<string, string>, body?: string): Promise<Raw> {
  return new Promise((resolve, reject) => {
    let answered = false;
    const length = body === undefined || "content-length" in headers ? {} : { "content-length": String(Buffer.byteLength(body)) };
    const req = httpRequest({ host: ours.hostname, port: ours.port, method, path, headers: { ...length, ...headers } }, (res) => {
      answered = true;
      let text = "";
      res.setEncoding("utf8");
      res.on("data", (chunk: string) => (text += chunk));
      res.on("end", () => resolve({ status: res.statusCode ?? 0, headers: res.headers, text }));
    });
    // A server that refuses a body it won't read closes the connection after answering; that is not a failure.
    req.on("error", (error) => {
      if (!answered) reject(error);
    });
    if (body !== undefined) req.write(body);
    req.end();
  });
}

const cookiesOf = (res: Raw) => ([] as string[]).concat(res.headers["set-cookie"] ?? []).map((c) => c.split(";")[0]).join("; ");
const onOurOrigin = (link: string) => new URL(link).origin === ours.origin;

let browser: Browser;
let attacker: Server;
let attackerOrigin = "";

beforeAll(async () => {
  browser = await launch();
  // A page on another port of the same host: same-site for cookies, another origin for everything else.
  attacker = createServer((req, res) => {
    res.writeHead(200, { "content-type": "text/html" });
    res.end(`<!doctype html><title>elsewhere</title><body>${decodeURIComponent(req.url?.slice(2) ?? "")}</body>`);
  });
  await new Promise<void>((resolve) => attacker.listen(0, "127.0.0.1", resolve));
  const address = attacker.address();
  attackerOrigin = `http://127.0.0.1:${typeof address === "object" && address ? address.port : 0}`;
});

afterAll(async () => {
  await browser?.close();
  await new Promise((resolve) => attacker?.close(resolve));
});

describe("sign-in links and every e-mailed link use the configured origin", () => {
  it("Auth.js's own link endpoint refuses a forged Origin, and with a forged Host and X-Forwarded-Host still links to us", async () => {
    const csrf = await raw("GET", "/api/auth/csrf", { host: EVIL, "x-forwarded-host": EVIL, "x-forwarded-proto": "https" });
    expect(csrf.status).toBe(200);
    const { csrfToken } = JSON.parse(csrf.text) as { csrfToken: string };
    const form = new URLSearchParams({ email: "stone@demo.example", csrfToken, callbackUrl: "/supplier" }).toString();
    const headers = { cookie: cookiesOf(csrf), "content-type": "application/x-www-form-urlencoded" };
    // The whole forgery, Origin included: refused before Auth.js sees it.
    const forged = await raw("POST", "/api/auth/signin/nodemailer", { ...FORGED, ...headers }, form);
    expect(forged.status).toBe(403);
    // Our Origin, but Host and X-Forwarded-* pointing elsewhere: the e-mailed link is still ours.
    const since = Date.now() - 1000;
    const res = await raw("POST", "/api/auth/signin/nodemailer", { ...FORGED, origin: ours.origin, ...headers }, form);
    expect(res.status).toBeLessThan(500);
    for (const location of [res.headers.location].flat()) if (location) expect(location).not.toContain(EVIL);
    const link = await waitForMailLink("stone@demo.example", since, (l) => l.includes("/api/auth/callback/nodemailer"));
    expect(new URL(link).host).not.toBe(EVIL);
    expect(onOurOrigin(link)).toBe(true);
  });

  it("the sign-in page's link form, sent by a browser with X-Forwarded-Host, still links to us", async () => {
    const context = await browser.newContext({ baseURL: baseUrl, extraHTTPHeaders: { "x-forwarded-host": EVIL, "x-forwarded-proto": "https" } });
    const page = await context.newPage();
    const since = Date.now() - 1000;
    await page.goto("/sign-in");
    await page.fill("#link-email", "joinery@demo.example");
    await page.getByRole("button", { name: "Send the link" }).click();
    await page.waitForURL(/\/sign-in\/check-email/);
    const link = await waitForMailLink("joinery@demo.example", since, (l) => l.includes("/api/auth/callback/nodemailer"));
    expect(onOurOrigin(link)).toBe(true);
    await context.close();
  });

  it("a designer's 'send to client', posted with a forged Host and X-Forwarded-Host, e-mails a link to us", async () => {
    const since = Date.now() - 1000;
    const cookie = (await cookieFor("designer", secret)) ?? "";
    const res = await raw("POST", "/api/decisions/demo-decision-ensuite-floor/send", {
      host: EVIL,
      "x-forwarded-host": EVIL,
      "x-forwarded-proto": "https",
      origin: ours.origin,
      cookie,
      "content-type": "application/json",
    }, "{}");
    expect(res.status).toBeLessThan(500);
    const link = await waitForMailLink("client@demo.example", since, (l) => l.includes("/client/decisions/demo-decision-ensuite-floor"));
    expect(onOurOrigin(link)).toBe(true);
  });

  it("a client's pick and a variation request, posted with a forged Host and X-Forwarded-Host, e-mail the studio links to us", async () => {
    const since = Date.now() - 1000;
    const cookie = (await cookieFor("client", secret)) ?? "";
    const forged = { host: EVIL, "x-forwarded-host": EVIL, "x-forwarded-proto": "https", origin: ours.origin, cookie, "content-type": "application/json" };
    const pick = await raw("POST", "/api/decisions/demo-decision-kitchen-pendant/choice", forged, JSON.stringify({ optionId: "demo-option-kp-opal", comment: "The opal, please" }));
    expect(pick.status).toBe(200);
    const request = await raw("POST", "/api/decisions/demo-decision-laundry-benchtop/variations", forged, JSON.stringify({ reason: "Could we price a pencil-round edge instead?" }));
    expect(request.status).toBeLessThan(300);
    const chose = await waitForMailLink("designer@demo.example", since, (l) => l.includes("/decisions/demo-decision-kitchen-pendant"));
    const varied = await waitForMailLink("designer@demo.example", since, (l) => l.includes("/variations/"));
    expect([chose, varied].every(onOurOrigin)).toBe(true);
  });

  it("server-action forms posted with X-Forwarded-Host (a project invitation, a team invitation) e-mail links to us", async () => {
    const context = await browser.newContext({ baseURL: baseUrl, extraHTTPHeaders: { "x-forwarded-host": EVIL, "x-forwarded-proto": "https" } });
    const page = await context.newPage();
    await signInWithPassword(page, "owner@demo.example");
    await page.waitForURL(/\/studio/);
    const since = Date.now() - 1000;
    const client = `forged-${Date.now().toString(36)}@homeowner.example`;
    await page.goto("/studio/projects/demo-project-marrow");
    await page.getByLabel("They are").selectOption({ label: "A client (homeowner)" });
    await page.locator("#invite-name").fill("Forged Host");
    await page.locator("#invite-email").fill(client);
    await page.getByRole("button", { name: "Send invitation" }).click();
    await page.getByText("Invitation sent.").first().waitFor();
    const designer = `forged-${Date.now().toString(36)}@studio.example`;
    await page.goto("/studio/team");
    await page.getByLabel("Name").fill("Forged Host");
    await page.getByLabel("E-mail address").fill(designer);
    await page.getByRole("button", { name: "Send invitation" }).click();
    await page.getByText(/Invitation sent/).first().waitFor();
    for (const to of [client, designer]) expect(onOurOrigin(await waitForMailLink(to, since, (l) => /^https?:/.test(l)))).toBe(true);
    await context.close();
  }, 60_000);

  it("no e-mail caught during these attacks links anywhere but our origin", async () => {
    const messages = (await (await fetch(`${baseUrl}/api/dev/mail`)).json()) as { links: string[] }[];
    const links = messages.flatMap((m) => m.links).filter((l) => /^https?:/.test(l));
    expect(links.length).toBeGreaterThan(0);
    expect(links.filter((l) => !onOurOrigin(l))).toEqual([]);
  });
});

describe("cross-site writes", () => {
  it("a page on another port cannot approve a client's decision with a no-cors text/plain fetch or a plain form", async () => {
    const page = await newPage(browser, "phone");
    await page.goto("/sign-in");
    await signInWithLink(page, "client2@demo.example");
    await page.waitForURL(/\/client/);
    const decision = "demo-decision-kitchen-splashback";
    const before = await page.request.get(`/api/decisions/${decision}`);
    expect(before.status()).toBe(200);
    const shown = (await before.json()) as { status: string; version: number; options: { id: string }[] };
    expect(shown.status).not.toBe("locked");
    const optionId = shown.options[0]?.id ?? "";
    const body = JSON.stringify({ optionId, confirm: true, version: shown.version });
    const target = `${baseUrl}/api/decisions/${decision}`;

    await page.goto(`${attackerOrigin}/?${encodeURIComponent("<p>elsewhere</p>")}`);
    const statuses = await page.evaluate(
      async ({ target, body }) => {
        const opaque = await fetch(`${target}/approve`, { method: "POST", mode: "no-cors", credentials: "include", headers: { "content-type": "text/plain" }, body });
        const choice = await fetch(`${target}/choice`, { method: "POST", mode: "no-cors", credentials: "include", headers: { "content-type": "text/plain" }, body });
        return [opaque.type, choice.type];
      },
      { target, body },
    );
    expect(statuses).toEqual(["opaque", "opaque"]);
    // And the oldest trick: a form that posts itself.
    await page.setContent(
      `<form id="f" method="post" enctype="text/plain" action="${target}/approve"><input name='${body.slice(0, -1)},"x":"' value='"}'></form>`,
    );
    await Promise.all([page.waitForLoadState("load"), page.evaluate(() => (document.getElementById("f") as HTMLFormElement).submit())]);
    await page.waitForTimeout(500);
    await snap(page, "attack-cross-site-form");

    await page.goto("/client");
    const after = (await (await page.request.get(`/api/decisions/${decision}`)).json()) as { status: string; version: number; history?: unknown[] };
    expect(after.status).toBe(shown.status);
    expect(after.version).toBe(shown.version);
    await page.context().close();
  });
});

describe("return addresses after sign-in", () => {
  it("a tab in the return path (/%09/evil.example) lands on our own page, for the password form", async () => {
    const page = await newPage(browser);
    await page.goto("/sign-in?callbackUrl=%2F%09%2Fevil.example%2Fx");
    await signInWithPassword(page, "designer@demo.example");
    await page.waitForURL((url) => url.pathname !== "/sign-in", { timeout: 15_000 });
    expect(new URL(page.url()).host).toBe(ours.host);
    await page.context().close();
  });

  it("and for an e-mailed link", async () => {
    const page = await newPage(browser, "phone");
    await page.goto("/sign-in?callbackUrl=%2F%09%2Fevil.example%2Fx");
    await signInWithLink(page, "client@demo.example");
    await page.waitForLoadState("load");
    expect(new URL(page.url()).host).toBe(ours.host);
    await page.context().close();
  });
});

describe("requests no route should see", () => {
  it("a broken percent-encoding in any path is 400, signed in or out", async () => {
    const cookie = (await cookieFor("designer", secret)) ?? "";
    for (const headers of [{}, { cookie }] as Record<string, string>[]) {
      for (const path of ["/api/boards/%E0%A4%A", "/studio/projects/%E0%A4%A", "/%ZZ"]) {
        const res = await raw("GET", path, headers);
        expect(res.status, path).toBe(400);
      }
    }
  });

  it("a JSON body over the limit is 413, declared or not, and a declared giant is refused unread", async () => {
    const cookie = (await cookieFor("client", secret)) ?? "";
    const headers = { cookie, origin: ours.origin, "content-type": "application/json" };
    const big = JSON.stringify({ optionId: "x", comment: "x".repeat(400 * 1024) });
    expect((await raw("POST", "/api/decisions/demo-decision-kitchen-pendant/choice", headers, big)).status).toBe(413);
    const declared = await raw("POST", "/api/decisions/demo-decision-kitchen-pendant/choice", { ...headers, "content-length": String(100 * 1024 * 1024) });
    expect(declared.status).toBe(413);
  });

  it("a NUL in a name is refused (400), not stored cut short", async () => {
    const cookie = (await cookieFor("designer", secret)) ?? "";
    const res = await raw("POST", "/api/finishes", { cookie, origin: ours.origin, "content-type": "application/json" }, JSON.stringify({ name: "Half\u0000hidden", category: "paint", surface: "matt", hex: "#d8d4cc" }));
    expect(res.status).toBe(400);
    expect(res.text).toMatch(/NUL/);
  });

  it("Origin: null on a client's pick is refused before anything is saved (403, not a 500)", async () => {
    const cookie = (await cookieFor("client", secret)) ?? "";
    const res = await raw("POST", "/api/decisions/demo-decision-kitchen-pendant/choice", { cookie, origin: "null", "content-type": "application/json" }, JSON.stringify({ optionId: "demo-option-kp-opal" }));
    expect(res.status).toBe(403);
  });
});

describe("the server itself", () => {
  it("listens on loopback only, so the caught-mail inbox is not on the network", async () => {
    const outside = Object.values(networkInterfaces())
      .flat()
      .find((a) => a && a.family === "IPv4" && !a.internal)?.address;
    // A machine with no network interface but loopback has nothing to check from.
    if (!outside) return;
    const reached = await new Promise<boolean>((resolve) => {
      const socket = connect({ host: outside, port: Number(ours.port) });
      socket.once("connect", () => {
        socket.destroy();
        resolve(true);
      });
      socket.once("error", () => resolve(false));
    });
    expect(reached).toBe(false);
  });
});
