import { eq } from "drizzle-orm";
import { beforeEach, describe, expect, it, vi } from "vitest";
import { db } from "@/db";
import { checkPassword } from "@/db/queries/passwords";
import { studios, users } from "@/db/schema";
import { SIGN_UP_FROM } from "@/lib/auth/limits";
import { readCaughtMail } from "@/lib/mail/caught";
import { idle, type ActionResult } from "@/lib/actions/result";

/**
 * Sign-up says the same to everyone (no account enumeration: OWASP ASVS v4.0.3 2.2.1 and the
 * Authentication Cheat Sheet on registration), and says what it did.
 */
const place = vi.hoisted(() => ({ address: "10.40.0.1" }));
vi.mock("next/headers", async () => {
  const { CLIENT_ADDRESS_HEADER } = await import("@/lib/client-address");
  return { headers: async () => new Headers({ [CLIENT_ADDRESS_HEADER]: place.address }) };
});

type Ended = { redirect: string } | { result: ActionResult };

async function signUpWith(fields: Record<string, string>): Promise<Ended> {
  const { signUp } = await import("@/app/(public)/sign-up/actions");
  const form = new FormData();
  for (const [key, value] of Object.entries(fields)) form.set(key, value);
  try {
    return { result: await signUp(idle, form) };
  } catch (error) {
    const digest = String((error as { digest?: string }).digest ?? "");
    if (!digest.startsWith("NEXT_REDIRECT")) throw error;
    return { redirect: digest.split(";")[2] ?? "" };
  }
}

const studioCount = async () => (await db.select().from(studios)).length;
const from = (address: string) => ({ address, knownDevice: false });

describe("sign-up", () => {
  let n = 0;
  beforeEach(() => {
    place.address = `10.40.0.${++n}`;
  });

  it("creates a new studio and owner with the chosen password, and ends at 'check your e-mail'", async () => {
    const before = await studioCount();
    const ended = await signUpWith({ studioName: "Larkspur Rooms", name: "Noor Vance", email: "Noor@Larkspur.example", password: "a-long-password-1" });
    expect(ended).toEqual({ redirect: "/sign-in/check-email?from=sign-up" });
    expect(await studioCount()).toBe(before + 1);
    const outcome = await checkPassword("noor@larkspur.example", "a-long-password-1", from("10.41.0.1"));
    expect(outcome.kind).toBe("signed-in");
  });

  it("answers an address that already has an account exactly as a new one, and changes nothing", async () => {
    const before = await studioCount();
    const hashBefore = (await db.query.users.findFirst({ where: eq(users.email, "owner@demo.example") }))?.passwordHash;
    const ended = await signUpWith({ studioName: "Copycat Studio", name: "Someone Else", email: "owner@demo.example", password: "attackers-password" });
    expect(ended).toEqual({ redirect: "/sign-in/check-email?from=sign-up" });
    expect(await studioCount()).toBe(before);
    expect((await db.query.users.findFirst({ where: eq(users.email, "owner@demo.example") }))?.passwordHash).toBe(hashBefore);
    expect((await checkPassword("owner@demo.example", "attackers-password", from("10.41.0.2"))).kind).toBe("refused");
  });

  it("sends back what was typed, never the password, when the form is refused", async () => {
    const ended = await signUpWith({ studioName: "Fern & Co", name: "", email: "fern@example.com", password: "short" });
    expect("result" in ended && ended.result).toMatchObject({
      ok: false,
      status: 400,
      values: { studioName: "Fern & Co", name: "", email: "fern@example.com" },
    });
    expect("result" in ended && !ended.result.ok && ended.result.values?.password).toBeFalsy();
  });

  it("lets one network address start 5 studios an hour, then says to wait (429)", async () => {
    place.address = "10.42.0.1";
    for (let i = 0; i < SIGN_UP_FROM.limit; i++) {
      expect(await signUpWith({ studioName: `Studio ${i}`, name: "Ana", email: `ana${i}@example.com`, password: "a-long-password-1" })).toHaveProperty("redirect");
    }
    const ended = await signUpWith({ studioName: "One more", name: "Ana", email: "ana-last@example.com", password: "a-long-password-1" });
    expect("result" in ended && ended.result).toMatchObject({ ok: false, status: 429, values: { email: "ana-last@example.com" } });
  });
});

describe("the e-mails behind one answer", () => {
  const dir = process.env.MAIL_CATCHER_DIR ?? "";
  const send = async (email: string, purpose: "sign-in" | "new" | "existing") => {
    const { forSignUp, sendLinkAfterAnswer } = await import("@/lib/auth/link-mail");
    const url = `http://somewhere.example/api/auth/callback/nodemailer?token=t&email=${encodeURIComponent(email)}`;
    const go = () => sendLinkAfterAnswer({ identifier: email, url });
    await (purpose === "sign-in" ? go() : forSignUp(purpose === "new", go));
    return readCaughtMail(dir, { to: email });
  };

  it("a new studio's owner gets a link to finish; an existing account a note that someone tried", async () => {
    const [fresh] = await send("fresh-owner@example.com", "new");
    expect(fresh?.subject).toBe("Finish starting your studio on Mottle");
    const [tried] = await send("designer@demo.example", "existing");
    expect(tried?.subject).toBe("Someone tried to start a studio with your e-mail address");
    // Either way the link is on the configured public origin, not the host Auth.js was given.
    const { publicOrigin } = await import("@/lib/env");
    for (const message of [fresh, tried]) expect(message?.links.some((l) => l.startsWith(`${publicOrigin}/api/auth/callback/nodemailer`))).toBe(true);
  });

  it("a link request reaches only an address with an account", async () => {
    expect(await send("no-account@example.com", "sign-in")).toHaveLength(0);
    const [link] = await send("client2@demo.example", "sign-in");
    expect(link?.subject).toBe("Your sign-in link for Mottle");
  });
});
