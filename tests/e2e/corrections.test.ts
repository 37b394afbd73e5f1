import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launch, newPage, signInWithPassword, snap } from "./support/browser";
import { newNoScriptPage, submitWithoutScript } from "./support/no-js";

// Correcting a project, its rooms and its people, as a designer would. Kept values after a refused
// save: WCAG 2.2 SC 3.3.7 Redundant Entry; forms posted with scripts off: common practice
// (progressive enhancement). Names and addresses are invented.
let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

const project = "/studio/projects/demo-project-marrow";
const button = (page: Page, name: string) => page.getByRole("button", { name, exact: true });

describe("correcting a project afterwards", () => {
  it("shows the rooms, people and Edit project controls at desktop and phone widths", async () => {
    for (const device of ["desktop", "phone"] as const) {
      const page = await newPage(browser, device);
      await signInWithPassword(page, "designer@demo.example");
      await page.waitForURL(/\/studio/);
      await page.goto(project);
      await page.getByRole("heading", { name: "Edit project" }).waitFor();
      await page.getByText("Change or remove Noor Haddad").first().click();
      await snap(page, `corrections-project-${device}`);
      await page.close();
    }
  });

  it("adds a room, moves it up, and refuses to remove the kitchen with a plain reason", async () => {
    const page = await newPage(browser);
    await signInWithPassword(page, "designer@demo.example");
      await page.waitForURL(/\/studio/);
    await page.goto(project);
    await page.fill("#new-room-name", "Powder room");
    await button(page, "Add room").click();
    await page.getByRole("status").filter({ hasText: "Room added." }).waitFor();
    await page.getByRole("button", { name: "Move up Powder room" }).click();
    await page.waitForFunction(() => document.querySelectorAll("main li input[name=name]")[2]?.getAttribute("value") === "Powder room");
    await page.getByRole("button", { name: "Remove Kitchen" }).click();
    await page.getByRole("alert").filter({ hasText: /^Kitchen has .*; move or remove them first\.$/ }).waitFor();
    await snap(page, "corrections-room-refused");
  });

  it("keeps what was typed when Edit project is refused with scripts off", async () => {
    const page = await newNoScriptPage(browser);
    await signInWithPassword(page, "owner@demo.example");
    await page.waitForURL(/\/studio/);
    await page.goto(project);
    await page.fill("#edit-project-name", "");
    await page.fill("#edit-project-siteAddress", "18 Marrow Street, Eastbrook");
    await submitWithoutScript(page, button(page, "Save project"));
    expect(await page.inputValue("#edit-project-siteAddress")).toBe("18 Marrow Street, Eastbrook");
    await snap(page, "corrections-no-js-edit-refused");
  });
});
