import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launch, newPage, signInWithPassword, snap } from "./support/browser";
import { newNoScriptPage, PROMPT_MS, submitWithoutScript } from "./support/no-js";

// Project rules (no outside source): a team invitation must not show the owner whether an address
// already had an account (identical answers against account enumeration: common practice, as in
// OWASP's Authentication Cheat Sheet). Forms posted with scripts off: progressive enhancement.
let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

const stamp = Date.now().toString(36);
const fresh = { name: "Juniper Hale", email: `juniper.${stamp}@example.com` };
const account = { name: "Bea (Northwall)", email: "other@demo.example" };

/** A team row's visible text with the person's own name and address taken out. */
async function rowText(page: Page, who: { name: string; email: string }) {
  const row = page.locator("li", { hasText: who.email });
  const text = (await row.innerText()).replaceAll(who.name, "<name>").replaceAll(who.email, "<email>");
  return text.replace(/\s+/g, " ").trim();
}

describe("a studio's team invitation", () => {
  it("lists a new address and another studio's owner the same way on the team page", async () => {
    const page = await newPage(browser);
    await signInWithPassword(page, "owner@demo.example");
    await page.waitForURL(/\/studio$/);
    await page.goto("/studio/team");
    for (const who of [fresh, account]) {
      await page.getByLabel("Name").fill(who.name);
      await page.getByLabel("E-mail address").fill(who.email);
      await page.getByRole("button", { name: "Send invitation" }).click();
      await expect(page.getByRole("status").first().textContent({ timeout: PROMPT_MS })).resolves.toMatch(/Invitation sent/);
    }
    await page.reload();
    const rows = [await rowText(page, fresh), await rowText(page, account)];
    expect(rows[0]).toContain("Invited, not joined yet");
    expect(rows[0]).toContain("Withdraw invitation");
    expect(rows[1]).toBe(rows[0]);
    await snap(page, "team-pending-invitations");
    await page.context().close();
  });

  it("with JavaScript off, another studio's owner sees it on their home page, can only decline, and is told why", async () => {
    const other = await newNoScriptPage(browser);
    await other.goto("/sign-in?callbackUrl=%2Fstudio");
    await other.fill("#password-email", account.email);
    await other.fill("#password", "mottle-demo");
    await submitWithoutScript(other, other.getByRole("button", { name: "Sign in", exact: true }));
    await other.goto("/studio");
    await expect(other.getByText("Fernleaf Interiors invited you to join their team").isVisible()).resolves.toBe(true);
    await expect(other.getByText("one studio's team only").isVisible()).resolves.toBe(true);
    await expect(other.getByRole("button", { name: /^Accept/ }).count()).resolves.toBe(0);
    await snap(other, "team-invitation-blocked-no-js");
    await submitWithoutScript(other, other.getByRole("button", { name: /^Decline/ }));
    await other.goto("/studio");
    await expect(other.getByText("Fernleaf Interiors invited you to join their team").count()).resolves.toBe(0);
    await other.context().close();
  });

  it("with JavaScript off, the owner withdraws the new address's invitation", async () => {
    const owner = await newNoScriptPage(browser);
    await owner.goto("/sign-in?callbackUrl=%2Fstudio%2Fteam");
    await owner.fill("#password-email", "owner@demo.example");
    await owner.fill("#password", "mottle-demo");
    await submitWithoutScript(owner, owner.getByRole("button", { name: "Sign in", exact: true }));
    await owner.goto("/studio/team");
    await expect(owner.getByText(account.email).count()).resolves.toBe(0);
    await submitWithoutScript(owner, owner.getByRole("button", { name: `Withdraw invitation: ${fresh.name}` }));
    await owner.goto("/studio/team");
    await expect(owner.getByText(fresh.email).count()).resolves.toBe(0);
    await owner.context().close();
  });
});
