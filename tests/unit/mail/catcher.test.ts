import { mkdtemp, rm, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startMailCatcher } from "@/lib/mail/catcher";
import type { MailCatcher } from "@/lib/mail/catcher";
import { readCaughtMail, waitForMail } from "@/lib/mail/caught";
import { createMailer } from "@/lib/mail/transport";
import type { Mailer } from "@/lib/mail/transport";

// Long enough to force quoted-printable soft line breaks, with "=" and "&" that QP and HTML both encode.
const LONG_URL =
  "https://mottle.example.com/api/auth/callback/email?token=Zm9vYmFyYmF6cXV4cXV1eGNvcmdlZ3JhdWx0Z2FycGx5d2FsZG8==" +
  "&email=ada%40example.com&callbackUrl=https%3A%2F%2Fmottle.example.com%2Fprojects%2Fkitchen-north";

function htmlWithLink(url: string): string {
  const href = url.replace(/&/g, "&amp;");
  return `<p>Hello — your link is below.</p><p><a href="${href}" style="color:#fff">Sign in</a></p>`;
}

describe("mail catcher", () => {
  let dir: string;
  let catcher: MailCatcher;
  let mailer: Mailer;

  beforeAll(async () => {
    dir = join(await mkdtemp(join(tmpdir(), "mottle-mail-")), "caught");
    catcher = await startMailCatcher({ port: 0, dir });
    mailer = createMailer({ smtpUrl: `smtp://127.0.0.1:${catcher.port}`, from: "Mottle <no-reply@mottle.example.com>" });
  });

  afterAll(async () => {
    await catcher.close();
    await rm(join(dir, ".."), { recursive: true, force: true });
  });

  it("listens on the actual port when asked for port 0", () => {
    expect(catcher.port).toBeGreaterThan(0);
  });

  it("stores a message with decoded subject, recipients and exact link", async () => {
    await mailer.send({
      to: "ada@example.com",
      subject: "Your sign-in link — kitchen north",
      text: `Hello — open this link to sign in:\n${LONG_URL}\n\n— Mottle`,
      html: htmlWithLink(LONG_URL),
    });

    const [message] = await readCaughtMail(dir, { to: "ada@example.com" });
    expect(message).toBeDefined();
    expect(message?.subject).toBe("Your sign-in link — kitchen north");
    expect(message?.to).toEqual(["ada@example.com"]);
    expect(message?.from).toBe("no-reply@mottle.example.com");
    expect(message?.links).toEqual([LONG_URL]);
    expect(message?.text).toContain(LONG_URL);
    expect(message?.html).toContain('href="https://mottle.example.com/api/auth/callback/email?token=');
    expect(new Date(message?.receivedAt ?? "").toISOString()).toBe(message?.receivedAt);
  });

  it("delivers a burst of messages sent at once over the pooled connections, every one", async () => {
    // Project behaviour: nodemailer's pooled SMTP transport (its documented `pool` option) keeps a
    // few connections open; a burst must still arrive whole.
    const sent = Array.from({ length: 20 }, (_, n) => mailer.send({ to: "burst@example.com", subject: `Burst ${n}`, text: `Message ${n}` }));
    await Promise.all(sent);
    const caught = await readCaughtMail(dir, { to: "burst@example.com" });
    expect(new Set(caught.map((m) => m.subject)).size).toBe(20);
  });

  it("lists newest first and filters by recipient", async () => {
    await mailer.send({ to: "bo@example.com", subject: "First for Bo", text: "https://mottle.example.com/one" });
    await mailer.send({
      to: ["bo@example.com", "cy@example.com"],
      subject: "Second for Bo and Cy",
      text: "See https://mottle.example.com/two.",
    });

    const forBo = await readCaughtMail(dir, { to: "BO@example.com" });
    expect(forBo.map((m) => m.subject)).toEqual(["Second for Bo and Cy", "First for Bo"]);
    expect(forBo[0]?.links).toEqual(["https://mottle.example.com/two"]);
    expect(forBo[0]?.html).toBeUndefined();

    const forCy = await readCaughtMail(dir, { to: "cy@example.com" });
    expect(forCy.map((m) => m.subject)).toEqual(["Second for Bo and Cy"]);

    const all = await readCaughtMail(dir);
    expect(all.map((m) => m.subject).slice(0, 2)).toEqual(["Second for Bo and Cy", "First for Bo"]);
    expect(await readCaughtMail(dir, { limit: 1 })).toHaveLength(1);
  });

  it("skips garbled and half-written files", async () => {
    await writeFile(join(dir, "zzzz-garbled.json"), '{"id": "half-writ');
    await writeFile(join(dir, "zzzz-wrong-shape.json"), JSON.stringify({ id: 1, subject: null }));
    await writeFile(join(dir, ".pending.json.tmp"), "{");

    const messages = await readCaughtMail(dir);
    expect(messages.length).toBeGreaterThanOrEqual(3);
    expect(messages.every((m) => typeof m.subject === "string")).toBe(true);
  });

  it("waits for a matching message that arrives later", async () => {
    const after = new Date();
    const waiting = waitForMail(dir, { to: "di@example.com", subjectIncludes: "Revision B", after, timeoutMs: 5_000 });
    setTimeout(() => {
      void mailer.send({ to: "di@example.com", subject: "Revision B issued", text: "https://mottle.example.com/r/b" });
    }, 150);
    const message = await waiting;
    expect(message.links).toEqual(["https://mottle.example.com/r/b"]);
  });

  it("times out with a clear error", async () => {
    await expect(waitForMail(dir, { to: "nobody@example.com", timeoutMs: 250 })).rejects.toThrow(
      /no e-mail to nobody@example\.com .*within 250 ms/,
    );
  });
});

describe("readCaughtMail", () => {
  it("returns nothing for a directory that does not exist", async () => {
    expect(await readCaughtMail(join(tmpdir(), "mottle-mail-does-not-exist", "caught"))).toEqual([]);
  });
});
