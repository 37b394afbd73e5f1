import { describe, expect, it } from "vitest";
import {
  clientChoseMessage,
  decisionWaitingMessage,
  invitationMessage,
  projectInvitationMessage,
  revisionIssuedMessage,
  signInLinkMessage,
  supplierAcknowledgedMessage,
  variationMessage,
} from "@/lib/mail/messages";
import type { EmailContent } from "@/lib/mail/messages";
import { escapeHtml, formatEmailDate } from "@/lib/mail/layout";

const URL_WITH_QUERY = "https://mottle.example.com/p/42?view=options&tab=finishes";
const EVIL = '<script>alert("x")</script>';

function hrefs(html: string): string[] {
  return [...html.matchAll(/href="([^"]*)"/g)].map((m) => m[1] ?? "");
}

function expectSafe(message: EmailContent): void {
  expect(message.html).not.toContain("<script>");
  expect(message.html).toContain("&lt;script&gt;");
  expect(message.text).toContain(EVIL);
  expect(hrefs(message.html)).toEqual([escapeHtml(URL_WITH_QUERY)]);
  expect(message.text).toContain(URL_WITH_QUERY);
  expect(message.text.trimEnd().endsWith("— Mottle")).toBe(true);
  expect(message.html).toContain("— Mottle");
  expect(message.html).not.toMatch(/<img|https?:\/\/(?!mottle\.example\.com)/);
}

describe("message builders", () => {
  it("builds the sign-in link e-mail", () => {
    const message = signInLinkMessage({ url: URL_WITH_QUERY, host: EVIL });
    expect(message.subject).toBe("Your sign-in link for Mottle");
    expect(message.text).toContain("24 hours");
    expect(message.text).toMatch(/didn’t ask/);
    expectSafe(message);
  });

  it("escapes every interpolated value in every builder", () => {
    const common = { url: URL_WITH_QUERY, projectName: EVIL };
    const messages = [
      invitationMessage({ url: URL_WITH_QUERY, studioName: EVIL, inviterName: EVIL, role: "client" }),
      invitationMessage({ ...common, studioName: "North Studio", inviterName: EVIL, role: "supplier" }),
      projectInvitationMessage({ ...common, studioName: EVIL, inviterName: EVIL, role: "client" }),
      decisionWaitingMessage({ ...common, decisionTitle: EVIL, dueDate: "2026-12-18T23:30:00Z" }),
      clientChoseMessage({ ...common, decisionTitle: EVIL, clientName: EVIL, optionLabel: EVIL, approved: true }),
      revisionIssuedMessage({ ...common, letter: "C", supplierName: EVIL, lineCount: 1 }),
      supplierAcknowledgedMessage({ ...common, letter: "C", supplierName: EVIL }),
      variationMessage({ ...common, decisionTitle: EVIL, stage: "priced" }),
    ];
    messages.forEach(expectSafe);
  });

  it("asks someone with an account to sign in and accept, promising nothing happens before (project rule)", () => {
    const message = projectInvitationMessage({ url: URL_WITH_QUERY, studioName: "Fernleaf Interiors", inviterName: "Rafe", role: "supplier", projectName: "Marrow Street terrace" });
    expect(message.subject).toBe("Fernleaf Interiors invited you to Marrow Street terrace on Mottle");
    expect(message.text).toContain("Sign in to Mottle with this e-mail address to accept or decline");
    expect(message.text).toContain("You won’t be added until you accept.");
  });

  it("shows due dates in UTC like Fri 18 Dec 2026", () => {
    expect(formatEmailDate(new Date("2026-12-18T23:30:00Z"))).toBe("Fri 18 Dec 2026");
    const message = decisionWaitingMessage({
      url: URL_WITH_QUERY,
      projectName: "Hillside kitchen",
      decisionTitle: "Worktop",
      dueDate: new Date("2026-12-18T00:00:00Z"),
    });
    expect(message.text).toContain("Fri 18 Dec 2026");
    expect(message.html).toContain("Fri 18 Dec 2026");
  });

  it("keeps subjects on one line and reflects approval", () => {
    const chose = clientChoseMessage({
      url: URL_WITH_QUERY,
      projectName: "Hillside kitchen",
      decisionTitle: "Splashback\ntile",
      clientName: "Sam",
      optionLabel: "Sage gloss",
      approved: false,
    });
    expect(chose.subject).toBe("Sam chose Sage gloss for Splashback tile");
    expect(chose.text).toContain("isn’t approved yet");
    const revision = revisionIssuedMessage({
      url: URL_WITH_QUERY,
      projectName: "Hillside kitchen",
      letter: "B",
      supplierName: "Joinery Co",
      lineCount: 12,
    });
    expect(revision.text).toContain("12 lines");
  });

  it("refuses links that are not http(s)", () => {
    expect(() => signInLinkMessage({ url: "javascript:alert(1)", host: "mottle.example.com" })).toThrow(/http/);
  });
});
