import { describe, expect, it } from "vitest";
import { checkPassword } from "@/db/queries/passwords";
import { THROTTLE_LIMIT } from "@/db/queries/throttle";

describe("password sign-in", () => {
  it("accepts the right password", async () => {
    const user = await checkPassword("designer@demo.example", "mottle-demo", "10.0.0.1");
    expect(user && user !== "throttled" ? user.email : null).toBe("designer@demo.example");
  });

  it("answers the same for an unknown e-mail and a wrong password", async () => {
    expect(await checkPassword("nobody@demo.example", "mottle-demo", "10.0.0.2")).toBeNull();
    expect(await checkPassword("owner@demo.example", "wrong-password", "10.0.0.3")).toBeNull();
  });

  it("refuses people who have no password (link-only accounts)", async () => {
    expect(await checkPassword("client@demo.example", "", "10.0.0.4")).toBeNull();
  });

  it("throttles an e-mail after repeated failures, even with the right password", async () => {
    for (let i = 0; i < THROTTLE_LIMIT; i++) {
      expect(await checkPassword("other@demo.example", "guess-" + i, `10.1.0.${i}`)).toBeNull();
    }
    expect(await checkPassword("other@demo.example", "mottle-demo", "10.1.1.1")).toBe("throttled");
  });

  it("throttles an address that tries many e-mails", async () => {
    for (let i = 0; i < THROTTLE_LIMIT; i++) {
      await checkPassword(`unknown${i}@demo.example`, "x", "10.2.0.9");
    }
    expect(await checkPassword("owner@demo.example", "mottle-demo", "10.2.0.9")).toBe("throttled");
  });
});
