import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launch, newPage, signInWithLink, signInWithPassword, snap } from "./support/browser";
import { newNoScriptPage, PROMPT_MS, submitWithoutScript } from "./support/no-js";

// Project rules (no outside source): someone who already has an account is only invited, sees the
// invitation on their home screen and joins when they accept. Kept values after a refusal: WCAG
// 2.2 SC 3.3.7 Redundant Entry; focus on the first field to fix: common practice.

let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

const PROJECT = "/studio/projects/demo-project-marrow";
const inviteForm = (page: Page) => page.locator("form", { has: page.getByRole("heading", { name: "Invite someone" }) });

describe("the designer invites (JavaScript on)", () => {
  it("keeps the supplier chosen and what was typed after a bad e-mail, with the focus on it", async () => {
    const page = await newPage(browser);
    await signInWithPassword(page, "designer@demo.example");
    await page.waitForURL(/\/studio$/);
    await page.goto(PROJECT);
    const form = inviteForm(page);
    await form.getByLabel("They are").selectOption({ label: "Contact at Kiln Lane Tiles & Bathware (Tiler)" });
    await form.getByLabel("Name", { exact: true }).fill("Kiln Lane orders");
    await form.getByLabel("E-mail address").fill("orders-at-kiln");
    await form.getByRole("button", { name: "Send invitation" }).click();
    await page.locator("#invite-email-error").waitFor({ timeout: PROMPT_MS });
    const again = inviteForm(page);
    expect(await again.getByLabel("They are").inputValue()).toBe("supplier:demo-supplier-tiles");
    expect(await again.getByLabel("Name", { exact: true }).inputValue()).toBe("Kiln Lane orders");
    await page.waitForFunction(() => document.activeElement?.id === "invite-email", undefined, { timeout: PROMPT_MS });
    await inviteForm(page).scrollIntoViewIfNeeded();
    await snap(page, "invite-form-error");

    await again.getByLabel("They are").selectOption("client");
    await again.getByLabel("Name", { exact: true }).fill("Wren (Fernleaf's client)");
    await again.getByLabel("E-mail address").fill("otherclient@demo.example");
    await again.getByRole("button", { name: "Send invitation" }).click();
    await expect(page.getByRole("status").first().textContent({ timeout: PROMPT_MS })).resolves.toMatch(/^Invitation sent/);
    await page.reload();
    await expect(page.getByText("Wren (Fernleaf's client)").count()).resolves.toBe(1);
    await expect(page.getByText("Wren Alcott").count()).resolves.toBe(0);
    await page.context().close();
  });
});

describe("the invited person answers", () => {
  it("sees the invitation on their phone home screen, accepts, and the project is theirs", async () => {
    const page = await newPage(browser, "phone");
    await page.goto("/sign-in");
    await signInWithLink(page, "otherclient@demo.example");
    await page.waitForURL(/\/client$/);
    await expect(page.getByRole("heading", { name: "An invitation for you" }).isVisible()).resolves.toBe(true);
    await expect(page.getByText("Fernleaf Interiors invited you as a client").isVisible()).resolves.toBe(true);
    await expect(page.getByText("Pendants over the island").count()).resolves.toBe(0);
    await snap(page, "pending-invitation-phone");
    await page.getByRole("button", { name: /^Accept/ }).click();
    await page.getByText("Pendants over the island").waitFor({ timeout: PROMPT_MS });
    await expect(page.getByRole("heading", { name: "An invitation for you" }).count()).resolves.toBe(0);
    await page.context().close();
  });

  it("with JavaScript off, another studio's staff can only decline, and are told why", async () => {
    const designer = await newPage(browser);
    await signInWithPassword(designer, "designer@demo.example");
    await designer.waitForURL(/\/studio$/);
    await designer.goto(PROJECT);
    await inviteForm(designer).getByLabel("Name", { exact: true }).fill("Bea");
    await inviteForm(designer).getByLabel("E-mail address").fill("other@demo.example");
    await inviteForm(designer).getByRole("button", { name: "Send invitation" }).click();
    await expect(designer.getByRole("status").first().textContent({ timeout: PROMPT_MS })).resolves.toMatch(/^Invitation sent/);
    await designer.context().close();

    const staff = await newNoScriptPage(browser);
    await staff.goto("/sign-in?callbackUrl=%2Fwelcome");
    await staff.fill("#password-email", "other@demo.example");
    await staff.fill("#password", "mottle-demo");
    await submitWithoutScript(staff, staff.getByRole("button", { name: "Sign in", exact: true }));
    await staff.goto("/welcome");
    await expect(staff.getByText("can't also join another project").isVisible()).resolves.toBe(true);
    await expect(staff.getByRole("button", { name: /^Accept/ }).count()).resolves.toBe(0);
    await snap(staff, "no-js-invitation-staff");
    await submitWithoutScript(staff, staff.getByRole("button", { name: /^Decline/ }));
    await staff.goto("/welcome");
    await expect(staff.getByRole("heading", { name: "An invitation for you" }).count()).resolves.toBe(0);
    await expect(staff.getByText("Go to your projects").isVisible()).resolves.toBe(true);
    await staff.context().close();
  });
});
