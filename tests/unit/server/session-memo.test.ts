import { describe, expect, it, vi } from "vitest";
import { createSessionMemo, isSessionCurrent, sessionToken } from "@/lib/auth/session-memo";

// Project rules: Auth.js's cookie names are its documented defaults (authjs.session-token, with
// __Secure- over HTTPS, split into .0, .1 … chunks when long); the rest is our own behaviour.
describe("the session cookie", () => {
  it("is found plain, secure or chunked, chunks in order, other cookies ignored", () => {
    expect(sessionToken([{ name: "theme", value: "x" }])).toBeNull();
    expect(sessionToken([{ name: "authjs.session-token", value: "abc" }])).toBe("authjs.session-token=abc");
    expect(sessionToken([{ name: "__Secure-authjs.session-token", value: "abc" }])).toBe("__Secure-authjs.session-token=abc");
    const chunked = sessionToken([
      { name: "authjs.session-token.10", value: "k" },
      { name: "authjs.session-token.2", value: "c" },
      { name: "authjs.csrf-token", value: "no" },
      { name: "authjs.session-token.0", value: "a" },
    ]);
    expect(chunked).toBe("authjs.session-token.0=a;authjs.session-token.2=c;authjs.session-token.10=k");
  });
});

const claims = { userId: "user-1", sessionVersion: 3 };

describe("who a session cookie belongs to", () => {
  it("asks Auth.js once per cookie while the memory lasts", async () => {
    const read = vi.fn(async () => claims);
    const userIdFor = createSessionMemo(read, 60_000);
    expect(await userIdFor("cookie-a")).toEqual(claims);
    expect(await userIdFor("cookie-a")).toEqual(claims);
    expect(read).toHaveBeenCalledTimes(1);
    await userIdFor("cookie-b");
    expect(read).toHaveBeenCalledTimes(2);
  });

  it("is nobody without a cookie, without asking", async () => {
    const read = vi.fn(async () => claims);
    expect(await createSessionMemo(read)(null)).toBeNull();
    expect(read).not.toHaveBeenCalled();
  });

  it("remembers a refused cookie as nobody, and forgets after the time-to-live", async () => {
    const read = vi.fn(async () => null);
    const userIdFor = createSessionMemo(read, 20);
    expect(await userIdFor("forged")).toBeNull();
    expect(await userIdFor("forged")).toBeNull();
    expect(read).toHaveBeenCalledTimes(1);
    await new Promise((resolve) => setTimeout(resolve, 60));
    await userIdFor("forged");
    expect(read).toHaveBeenCalledTimes(2);
  });
});

// Our own rule (the session version, db/queries/sessions.ts): the memo keeps claims, and each
// request compares them with the person's current version, so an ended session stops at once.
describe("whether a remembered session still stands", () => {
  it("stands only with the person's current version", () => {
    expect(isSessionCurrent(claims, { sessionVersion: 3 })).toBe(true);
    expect(isSessionCurrent(claims, { sessionVersion: 4 })).toBe(false);
    expect(isSessionCurrent(claims, null)).toBe(false);
    expect(isSessionCurrent(null, { sessionVersion: 3 })).toBe(false);
  });

  it("refuses claims without a whole-number version (a cookie sealed before versions existed)", () => {
    expect(isSessionCurrent({ userId: "user-1", sessionVersion: Number.NaN }, { sessionVersion: 0 })).toBe(false);
    expect(isSessionCurrent({ userId: "user-1", sessionVersion: 0.5 }, { sessionVersion: 0.5 })).toBe(false);
  });
});
