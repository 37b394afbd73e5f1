import { describe, expect, it } from "vitest";
import { ACCOUNT_DELAY, ADDRESS_LIMIT, accountDelayMs, checkPassword, type PasswordOutcome } from "@/db/queries/passwords";

/**
 * Password sign-in under its limits (db/queries/passwords.ts). The waits are recorded, not slept
 * (checkPassword takes the pause as a parameter). Our own rules; sources beside each check.
 */
const from = (address: string, knownDevice = false) => ({ address, knownDevice });

function recorder() {
  const waits: number[] = [];
  return { waits, wait: async (ms: number) => void waits.push(ms) };
}

const emailOf = (outcome: PasswordOutcome) => (outcome.kind === "signed-in" ? outcome.user.email : outcome.kind);

describe("password sign-in", () => {
  it("accepts the right password", async () => {
    expect(emailOf(await checkPassword("designer@demo.example", "mottle-demo", from("10.0.0.1")))).toBe("designer@demo.example");
  });

  it("answers the same for an unknown e-mail and a wrong password", async () => {
    // OWASP ASVS v4.0.3 2.2.1 / Authentication Cheat Sheet: one generic answer, no account enumeration.
    expect(await checkPassword("nobody@demo.example", "mottle-demo", from("10.0.0.2"))).toEqual({ kind: "refused" });
    expect(await checkPassword("owner@demo.example", "wrong-password", from("10.0.0.3"))).toEqual({ kind: "refused" });
  });

  it("refuses people who have no password (link-only accounts)", async () => {
    expect(await checkPassword("client@demo.example", "", from("10.0.0.4"))).toEqual({ kind: "refused" });
  });
});

describe("per account: a growing delay, never a lock-out", () => {
  it("waits nothing for the first tries, then doubles up to a cap of a few seconds", () => {
    // Our own numbers (common practice: exponential back-off with a cap). ASVS v4.0.3 2.2.1 asks
    // for anti-automation that does not lock out the real person.
    const delays = Array.from({ length: 10 }, (_, failures) => accountDelayMs(failures));
    expect(delays.slice(0, ACCOUNT_DELAY.freeTries)).toEqual([0, 0, 0]);
    expect(delays.slice(3, 7)).toEqual([500, 1000, 2000, 4000]);
    expect(Math.max(...delays)).toBe(ACCOUNT_DELAY.maxMs);
  });

  it("still signs in with the right password after many wrong ones from many addresses", async () => {
    const { waits, wait } = recorder();
    for (let i = 0; i < 12; i++) {
      expect(await checkPassword("other@demo.example", `guess-${i}`, from(`10.1.0.${i}`), wait)).toEqual({ kind: "refused" });
    }
    const outcome = await checkPassword("other@demo.example", "mottle-demo", from("10.1.1.1"), wait);
    expect(emailOf(outcome)).toBe("other@demo.example");
    expect(waits.at(-1)).toBe(ACCOUNT_DELAY.maxMs);
    // The right password clears the account's count: the next try waits nothing.
    await checkPassword("other@demo.example", "mottle-demo", from("10.1.1.2"), wait);
    expect(waits.at(-1)).toBe(0);
  });

  it("delays an unknown e-mail exactly as a real one, so the delay says nothing about accounts", async () => {
    await checkPassword("owner@demo.example", "mottle-demo", from("10.3.9.9")); // a clean count to start from
    const known = recorder();
    const unknown = recorder();
    for (let i = 0; i < 6; i++) {
      await checkPassword("owner@demo.example", `guess-${i}`, from(`10.3.0.${i}`), known.wait);
      await checkPassword("no-such-owner@demo.example", `guess-${i}`, from(`10.3.1.${i}`), unknown.wait);
    }
    expect(unknown.waits).toEqual(known.waits);
    await checkPassword("owner@demo.example", "mottle-demo", from("10.3.2.1"));
  });
});

describe("per network address: a hard limit, answered 429", () => {
  it("refuses an address after 10 failures, whichever e-mails it tried, without checking the password", async () => {
    for (let i = 0; i < ADDRESS_LIMIT.limit; i++) await checkPassword(`unknown${i}@demo.example`, "x", from("10.2.0.9"));
    const outcome = await checkPassword("owner@demo.example", "mottle-demo", from("10.2.0.9"));
    expect(outcome.kind).toBe("throttled");
    // RFC 6585 §4: a 429 may say how long to wait; the window is 15 minutes.
    const seconds = outcome.kind === "throttled" ? outcome.retryAfterSeconds : 0;
    expect(seconds).toBeGreaterThan(0);
    expect(seconds).toBeLessThanOrEqual(ADDRESS_LIMIT.windowMs / 1000);
  });

  it("does not stop anyone on another address", async () => {
    expect(emailOf(await checkPassword("owner@demo.example", "mottle-demo", from("10.2.0.10")))).toBe("owner@demo.example");
  });

  it("does not stop a browser that signed in to that account before (known device)", async () => {
    expect(emailOf(await checkPassword("owner@demo.example", "mottle-demo", from("10.2.0.9", true)))).toBe("owner@demo.example");
    // Only for that account's right password: a wrong one from the known device is still refused.
    expect(await checkPassword("owner@demo.example", "wrong", from("10.2.0.9", true))).toEqual({ kind: "refused" });
  });

  it("counts tries sent together, so a burst cannot slip past the limit", async () => {
    const burst = await Promise.all(
      Array.from({ length: ADDRESS_LIMIT.limit + 5 }, (_, i) => checkPassword(`burst${i}@demo.example`, "x", from("10.4.0.1"), async () => {})),
    );
    expect(burst.filter((o) => o.kind === "refused").length).toBeLessThanOrEqual(ADDRESS_LIMIT.limit);
    expect(burst.filter((o) => o.kind === "throttled").length).toBeGreaterThanOrEqual(5);
  });
});
