import type { Browser } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launch, newPage, signInWithLink, signInWithPassword, snap } from "./support/browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

describe("each role signs in and lands on their home", () => {
  it("owner, with a password", async () => {
    const page = await newPage(browser);
    await signInWithPassword(page, "owner@demo.example");
    await page.waitForURL(/\/studio$/);
    await expect(page.getByRole("heading", { level: 1, name: "Projects" }).isVisible()).resolves.toBe(true);
    await expect(page.getByText("Marrow Street terrace").first().isVisible()).resolves.toBe(true);
    await snap(page, "owner-home");
  });

  it("designer, with a password", async () => {
    const page = await newPage(browser);
    await signInWithPassword(page, "designer@demo.example");
    await page.waitForURL(/\/studio$/);
    await expect(page.getByText("Needs attention").isVisible()).resolves.toBe(true);
    await snap(page, "designer-home");
  });

  it("client, on a phone, with an e-mailed link", async () => {
    const page = await newPage(browser, "phone");
    await page.goto("/sign-in");
    await signInWithLink(page, "client@demo.example");
    await page.waitForURL(/\/client$/);
    await expect(page.getByText("Marrow Street terrace").first().isVisible()).resolves.toBe(true);
    await expect(page.getByText("Pendants over the island").isVisible()).resolves.toBe(true);
    await snap(page, "client-home-phone");
  });

  it("supplier, on a phone, with an e-mailed link", async () => {
    const page = await newPage(browser, "phone");
    await page.goto("/sign-in");
    await signInWithLink(page, "stone@demo.example");
    await page.waitForURL(/\/supplier$/);
    await expect(page.getByText("Revision A").isVisible()).resolves.toBe(true);
    await snap(page, "supplier-home-phone");
  });
});

describe("signed out", () => {
  it("a private page sends the visitor to sign-in and back after it", async () => {
    const page = await newPage(browser);
    await page.goto("/studio/team");
    await page.waitForURL(/\/sign-in\?callbackUrl=%2Fstudio%2Fteam/);
    await snap(page, "sign-in");
    await signInWithPassword(page, "designer@demo.example");
    await page.waitForURL(/\/studio\/team$/);
    await expect(page.getByRole("heading", { level: 1, name: "Team" }).isVisible()).resolves.toBe(true);
  });

  it("a wrong password gets a plain message and no session", async () => {
    const page = await newPage(browser);
    await signInWithPassword(page, "owner@demo.example", "not-the-password");
    await page.getByText(/don't match an account/).waitFor();
    await snap(page, "sign-in-wrong-password");
    const res = await page.request.get("/api/me");
    expect(res.status()).toBe(401);
  });

  it("an unknown page gets a real 404 page", async () => {
    const page = await newPage(browser);
    const res = await page.goto("/no-such-page");
    expect(res?.status()).toBe(404);
    await expect(page.getByRole("heading", { name: "We couldn't find that page" }).isVisible()).resolves.toBe(true);
  });

  it("a client cannot open studio pages", async () => {
    const page = await newPage(browser, "phone");
    await page.goto("/sign-in");
    await signInWithLink(page, "client2@demo.example");
    await page.waitForURL(/\/client$/);
    await page.goto("/studio");
    await page.waitForURL(/\/forbidden$/);
    await snap(page, "client-forbidden");
  });
});
