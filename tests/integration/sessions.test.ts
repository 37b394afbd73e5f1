import { describe, expect, it } from "vitest";
import { writeTransaction } from "@/db/queries/serial-write";
import { currentSessionVersion, endSessions, endSessionsSealedWith } from "@/db/queries/sessions";
import { getActor } from "@/db/queries/users";
import { actAs, demoUserId } from "@/tests/support/session";

/**
 * Sessions that really end (db/queries/sessions.ts): a session is sealed with the person's
 * session version and refused once the version moves on. OWASP ASVS v4.0.3 3.3.1 (logout
 * invalidates the session) and 3.3.3 (option to end all other sessions); the rest is our own.
 */
const me = async () => {
  const { GET } = await import("@/app/api/me/route");
  return (await GET(new Request("http://test/api/me"), undefined)).status;
};

describe("ending a person's sessions", () => {
  it("refuses their next request at once, and a new sign-in works again", async () => {
    actAs("designer");
    expect(await me()).toBe(200);
    await endSessions(demoUserId("designer"));
    expect(await me()).toBe(401);
    actAs("designer"); // signs in again: sealed with the new version
    expect(await me()).toBe(200);
  });

  it("is not hidden by the cached person (getActor is cached until the next write)", async () => {
    const before = await getActor(demoUserId("client"));
    expect(await getActor(demoUserId("client"))).toBe(before); // served from the cache
    await endSessions(demoUserId("client"));
    expect((await getActor(demoUserId("client")))?.sessionVersion).toBe((before?.sessionVersion ?? 0) + 1);
  });

  it("lands with the caller's own transaction, or not at all", async () => {
    const id = demoUserId("stone");
    const start = await currentSessionVersion(id);
    await expect(
      writeTransaction(async (tx) => {
        await endSessions(id, tx);
        throw new Error("the change it belongs to failed");
      }),
    ).rejects.toThrow();
    expect(await currentSessionVersion(id)).toBe(start);
    await writeTransaction((tx) => endSessions(id, tx));
    expect(await currentSessionVersion(id)).toBe((start ?? 0) + 1);
  });

  it("lets only a session that still stands end the others (an old cookie cannot keep signing someone out)", async () => {
    const id = demoUserId("joinery");
    const start = (await currentSessionVersion(id)) ?? 0;
    await endSessionsSealedWith(id, start - 1);
    expect(await currentSessionVersion(id)).toBe(start);
    await endSessionsSealedWith(id, start);
    expect(await currentSessionVersion(id)).toBe(start + 1);
  });
});

describe("signing out", () => {
  it("ends the session everywhere, not only the cookie in this browser", async () => {
    actAs("owner");
    expect(await me()).toBe(200);
    const before = await currentSessionVersion(demoUserId("owner"));
    const { signOutAction } = await import("@/lib/actions/sign-out");
    await signOutAction();
    expect(await currentSessionVersion(demoUserId("owner"))).toBe((before ?? 0) + 1);
    // The same stub session stands for a copy of the cookie saved before signing out.
    expect(await me()).toBe(401);
  });
});
