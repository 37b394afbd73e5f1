import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launch, newPage, signInWithPassword, snap } from "./support/browser";

// The studio's one access standard (AS 1428.1 luminance contrast, BS 8300-2 LRV points, or both;
// figures as quoted in DOMAIN.md), the checks that name it, and the LRV flag in the library.
let browser: Browser;
let owner: Page;
let designer: Page;
beforeAll(async () => {
  browser = await launch();
  owner = await newPage(browser);
  await signInWithPassword(owner, "owner@demo.example");
  await owner.waitForURL(/\/studio$/);
  designer = await newPage(browser);
  await signInWithPassword(designer, "designer@demo.example");
  await designer.waitForURL(/\/studio$/);
});
afterAll(async () => {
  await browser?.close();
});

async function chooseStandard(label: RegExp) {
  await owner.goto("/studio/settings");
  await owner.getByRole("radio", { name: label }).check();
  await owner.getByRole("button", { name: "Save access standard" }).click();
  await owner.getByText(/^Saved\. Every board and decision now checks access by this standard\./).waitFor();
}

const BOARD = "/studio/projects/demo-project-marrow/boards/demo-board-kitchen-a";
const edge = () => designer.locator('[data-pair-id="demo-pair-bench-edge-floor"]');

describe("the access standard, chosen once, named in every verdict", () => {
  it("the board's checks name AS 1428.1 by default", async () => {
    await designer.goto(BOARD);
    await designer.getByRole("heading", { name: "Checks" }).waitFor();
    // Saltbush (LRV 64) on Light Oak Herringbone (46): 125 × 18 / 135 = 16.7 % [AS 1428.1 formula, as quoted].
    await expect(edge().textContent()).resolves.toMatch(/Fails AS 1428\.1: 17 % luminance contrast, 30 % needed\./);
    await designer.locator('section[aria-labelledby="checks-title"]').screenshot({ path: "tests/artifacts/access-checks-as1428.png" });
  }, 120_000);

  it("the owner chooses BS 8300-2 in settings, and the board's checks follow it", async () => {
    await owner.goto("/studio/settings");
    await owner.getByRole("heading", { name: "Access checks for people with low vision" }).waitFor();
    await snap(owner, "access-settings-owner");
    await chooseStandard(/BS 8300-2/);
    await designer.goto(BOARD);
    await designer.getByRole("heading", { name: "Checks" }).waitFor();
    await expect(edge().textContent()).resolves.toMatch(/Fails BS 8300-2: 18 LRV points apart, 30 needed\./);
    await designer.locator('section[aria-labelledby="checks-title"]').screenshot({ path: "tests/artifacts/access-checks-bs8300.png" });
    await chooseStandard(/Both/);
    await designer.reload();
    await designer.getByRole("heading", { name: "Checks" }).waitFor();
    await expect(edge().textContent()).resolves.toMatch(/Fails AS 1428\.1: 17 % .* Fails BS 8300-2: 18 LRV points/);
    await snap(designer, "access-board-both");
    await chooseStandard(/AS 1428\.1/);
  }, 120_000);

  it("a designer reads the standard but cannot change it", async () => {
    await designer.goto("/studio/settings");
    await designer.getByText("Only the studio's owner can change this.").waitFor();
    await expect(designer.getByRole("radio").count()).resolves.toBe(0);
    await snap(designer, "access-settings-designer");
  }, 60_000);

  it("flags a published LRV its own colour contradicts, on the finish page and in the library", async () => {
    await designer.goto("/studio/library/demo-finish-cab-oat");
    await designer.getByText("The LRV and the colour disagree").waitFor();
    await expect(designer.getByText(/The published LRV 48 is 28 points below the 76/).isVisible()).resolves.toBe(true);
    await snap(designer, "access-finish-lrv-flag");
    // Similar colours: cabinetry only, other categories on request.
    await designer.getByText(/ only: finishes that could take this one's place\./).waitFor();
    await designer.getByRole("checkbox", { name: "Include other categories" }).check();
    await designer.getByText(/Every category: colours to echo elsewhere/).waitFor();
    await snap(designer, "access-finish-similar-any");
    await designer.goto("/studio/library?q=oat");
    await designer.locator("[data-lrv-flag]").first().waitFor();
    await snap(designer, "access-library-lrv-flag");
  }, 120_000);
});
