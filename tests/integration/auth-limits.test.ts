import { describe, expect, it } from "vitest";
import { readCount } from "@/db/queries/throttle";
import { allowSignInLink, allowSignUp, LINK_FROM, MAIL_TO, SIGN_UP_FROM } from "@/lib/auth/limits";
import { TooManyRequests } from "@/lib/auth/too-many";
import { CLIENT_ADDRESS_HEADER } from "@/lib/client-address";
import { publicOrigin } from "@/lib/env";

/**
 * Limits on e-mails sent at a stranger's request (lib/auth/limits.ts) and on Auth.js's own POST
 * endpoints (app/api/auth/[...nextauth]/route.ts). 429 and Retry-After: RFC 6585 §4, RFC 9110
 * §10.2.3. The numbers are our own (common practice: small fixed windows).
 */
const refusal = (p: Promise<unknown>) =>
  p.then(
    () => null,
    (e: unknown) => (e instanceof TooManyRequests ? e : Promise.reject(e)),
  );

describe("sign-in links", () => {
  it("sends at most 5 e-mails to one address in 15 minutes, whoever asks", async () => {
    for (let i = 0; i < MAIL_TO.limit; i++) expect(await refusal(allowSignInLink("flooded@example.com", `10.20.0.${i}`))).toBeNull();
    const refused = await refusal(allowSignInLink("flooded@example.com", "10.20.1.1"));
    expect(refused?.status).toBe(429);
    expect(refused?.retryAfterSeconds).toBeGreaterThan(0);
    expect(refused?.retryAfterSeconds).toBeLessThanOrEqual(MAIL_TO.windowMs / 1000);
    // A refused request does not count: it cannot push the wait further out.
    expect((await readCount(MAIL_TO.prefix + "flooded@example.com", MAIL_TO.windowMs)).count).toBe(MAIL_TO.limit);
  });

  it("lets one network address ask for 20 links in 15 minutes, to any addresses", async () => {
    for (let i = 0; i < LINK_FROM.limit; i++) expect(await refusal(allowSignInLink(`walker${i}@example.com`, "10.21.0.1"))).toBeNull();
    expect((await refusal(allowSignInLink("walker-last@example.com", "10.21.0.1")))?.status).toBe(429);
    expect(await refusal(allowSignInLink("walker-last@example.com", "10.21.0.2"))).toBeNull();
  });

  it("starts counting again when the window ends", async () => {
    const start = Date.now() - MAIL_TO.windowMs - 1000;
    for (let i = 0; i < MAIL_TO.limit; i++) await allowSignInLink("patient@example.com", `10.22.0.${i}`, start);
    expect(await refusal(allowSignInLink("patient@example.com", "10.22.1.1"))).toBeNull();
  });
});

describe("sign-ups", () => {
  it("lets one network address start 5 studios an hour", async () => {
    for (let i = 0; i < SIGN_UP_FROM.limit; i++) expect(await refusal(allowSignUp(`studio${i}@example.com`, "10.23.0.1"))).toBeNull();
    const refused = await refusal(allowSignUp("studio-last@example.com", "10.23.0.1"));
    expect(refused?.status).toBe(429);
    expect(refused?.message).toMatch(/Too many attempts to start a studio\. Wait \d+ minutes?/);
  });

  it("shares the per-address e-mail limit with sign-in links", async () => {
    for (let i = 0; i < MAIL_TO.limit; i++) await allowSignUp("shared@example.com", `10.24.0.${i}`);
    expect((await refusal(allowSignInLink("shared@example.com", "10.24.1.1")))?.status).toBe(429);
  });
});

describe("Auth.js's own POST endpoints", () => {
  const post = async (path: string, body: Record<string, string>, address: string) => {
    const { POST } = await import("@/app/api/auth/[...nextauth]/route");
    return POST(
      new Request(`http://test${path}`, {
        method: "POST",
        headers: { "content-type": "application/x-www-form-urlencoded", origin: publicOrigin, [CLIENT_ADDRESS_HEADER]: address },
        body: new URLSearchParams(body).toString(),
      }),
      undefined,
    );
  };

  it("answer a link flood with 429 and Retry-After, not only the form", async () => {
    for (let i = 0; i < MAIL_TO.limit; i++) expect((await post("/api/auth/signin/nodemailer", { email: "direct@example.com" }, "10.25.0.1")).status).toBe(302);
    const res = await post("/api/auth/signin/nodemailer", { email: "Direct@Example.com " }, "10.25.0.2");
    expect(res.status).toBe(429);
    expect(Number(res.headers.get("retry-after"))).toBeGreaterThan(0);
    expect(((await res.json()) as { error: string }).error).toMatch(/Too many sign-in links/);
  });

  it("count JSON bodies too (Auth.js reads both)", async () => {
    const { POST } = await import("@/app/api/auth/[...nextauth]/route");
    const send = () =>
      POST(
        new Request("http://test/api/auth/signin/nodemailer", {
          method: "POST",
          headers: { "content-type": "application/json", origin: publicOrigin, [CLIENT_ADDRESS_HEADER]: "10.26.0.1" },
          body: JSON.stringify({ email: "json@example.com" }),
        }),
        undefined,
      );
    for (let i = 0; i < MAIL_TO.limit; i++) await send();
    expect((await send()).status).toBe(429);
  });

  it("refuse a password sign-in from an address over its limit before any password is checked", async () => {
    const { checkPassword, ADDRESS_LIMIT } = await import("@/db/queries/passwords");
    for (let i = 0; i < ADDRESS_LIMIT.limit; i++) await checkPassword(`nobody${i}@example.com`, "x", { address: "10.27.0.1", knownDevice: false });
    const res = await post("/api/auth/callback/credentials", { email: "owner@demo.example", password: "mottle-demo" }, "10.27.0.1");
    expect(res.status).toBe(429);
    expect(Number(res.headers.get("retry-after"))).toBeGreaterThan(0);
    expect((await post("/api/auth/callback/credentials", { email: "owner@demo.example", password: "mottle-demo" }, "10.27.0.2")).status).toBe(302);
  });

  it("refuse a link request without a valid e-mail before Auth.js sees it", async () => {
    expect((await post("/api/auth/signin/nodemailer", { email: "not an e-mail" }, "10.28.0.1")).status).toBe(400);
  });

  it("never read X-Forwarded-For: a made-up one per try is still the same caller", async () => {
    const { POST } = await import("@/app/api/auth/[...nextauth]/route");
    const statuses: number[] = [];
    for (let i = 0; i < LINK_FROM.limit + 2; i++) {
      const res = await POST(
        new Request("http://test/api/auth/signin/nodemailer", {
          method: "POST",
          headers: {
            "content-type": "application/x-www-form-urlencoded",
            origin: publicOrigin,
            [CLIENT_ADDRESS_HEADER]: "10.29.0.1",
            "x-forwarded-for": `203.0.113.${i}`,
          },
          body: new URLSearchParams({ email: `xff${i}@example.com` }).toString(),
        }),
        undefined,
      );
      statuses.push(res.status);
    }
    expect(statuses.slice(-2)).toEqual([429, 429]);
  });
});
