import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launch, newPage, signInWithPassword, snap } from "./support/browser";
import { expectServerAnswers, isFocused, newNoScriptPage, PROMPT_MS, submitWithoutScript as submit } from "./support/no-js";

// The studio's markup and tax, and an option's price worked out from its finishes, as the owner
// and a designer see them. Demo data is invented; GST 10 % is the ATO's rate (GST Act 1999 s 9-70).
let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

describe("studio settings and built prices", () => {
  it("without JavaScript, the owner's refused settings keep what was typed and focus the field to fix; then save", async () => {
    const owner = await newNoScriptPage(browser);
    await signInWithPassword(owner, "owner@demo.example");
    await owner.waitForURL(/\/studio$/, { timeout: PROMPT_MS });
    await owner.goto("/studio/settings");
    expect(await owner.inputValue("#field-tax")).toBe("10");
    await owner.fill("#field-markup", "12,5");
    await submit(owner, owner.getByRole("button", { name: "Save settings" }));
    await expect(owner.locator("#field-markup-error").textContent()).resolves.toMatch(/full stop/);
    expect(await owner.inputValue("#field-markup")).toBe("12,5");
    expect(await isFocused(owner.locator("#field-markup"))).toBe(true);
    await snap(owner, "settings-no-js-refused");
    await expectServerAnswers();
    await owner.fill("#field-markup", "0");
    await submit(owner, owner.getByRole("button", { name: "Save settings" }));
    await owner.getByText(/^Saved\./).waitFor();
    await owner.close();
  }, 120_000);

  it("a designer sees the rates, and a new option's price worked out as the finishes are chosen", async () => {
    const page = await newPage(browser);
    await signInWithPassword(page, "designer@demo.example");
    await page.waitForURL(/\/studio$/);
    await page.goto("/studio/settings");
    await page.getByText("Only the studio's owner can change these.").waitFor();
    await snap(page, "settings-designer");

    await page.goto("/studio/projects/demo-project-marrow/decisions/new");
    await page.getByLabel("Finish", { exact: true }).nth(0).selectOption({ label: "Natural Oak Veneer · TJ-VN-201" });
    await page.getByLabel("Quantity").nth(0).fill("1.2");
    // 1.2 m² × $420.00 = $504.00 cost; no markup; GST $50.40; $554.40 for the client.
    await page.getByText("$554.40").first().waitFor();
    await expect(page.getByText("$504.00").first().isVisible()).resolves.toBe(true);
    await page.locator("fieldset").first().screenshot({ path: "tests/artifacts/pricing-option-form.png" });

    await page.goto("/studio/projects/demo-project-marrow/decisions/demo-decision-kitchen-pendant");
    await page.getByText("Price set by hand").first().waitFor();
    await snap(page, "pricing-option-breakdown");
    await page.close();
  }, 120_000);
});
