import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseUrl, launch, newPage, signInWithLink, signInWithPassword, snap } from "./support/browser";

// The hand-off as people walk it: the designer adds a fixed item and issues a revision; the stone
// supplier, on a phone, follows the e-mailed link, signs in, sees only their lines, acknowledges
// and records an order date; the designer sees the acknowledgement.
const project = "/studio/projects/demo-project-marrow";
const item = `Splashback upstand ${Date.now().toString(36)}`;

let browser: Browser;
let designer: Page;
let letter = "";
let revisionLink = "";

type Caught = { to: string[]; subject: string; links: string[]; receivedAt: string };

async function waitForRevisionMail(email: string, subject: string): Promise<string> {
  for (let i = 0; i < 80; i++) {
    const messages = (await (await fetch(`${baseUrl}/api/dev/mail?to=${encodeURIComponent(email)}`)).json()) as Caught[];
    const link = messages.find((m) => m.subject.startsWith(subject))?.links.find((l) => l.includes("/supplier/revisions/"));
    if (link) return link;
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`no "${subject}" e-mail reached ${email}`);
}

beforeAll(async () => {
  browser = await launch();
  designer = await newPage(browser);
  await designer.goto(`${project}/specification`);
  await signInWithPassword(designer, "designer@demo.example");
  await designer.waitForURL(/\/specification$/);
});
afterAll(async () => {
  await browser?.close();
});

describe("specification revisions and supplier hand-off", () => {
  it("the designer adds a fixed item, issues a revision and sees its hash", async () => {
    await designer.getByRole("link", { name: "Add a fixed item" }).click();
    await designer.waitForURL(/fixed-items\/new$/);
    await designer.selectOption("#fixed-room", { label: "Kitchen" });
    await designer.fill("#fixed-item", item);
    await designer.selectOption("#fixed-finish", "demo-finish-saltbush");
    await designer.fill("#fixed-location", "Behind the cooktop");
    await designer.fill("#fixed-quantity", "0.6");
    await designer.getByRole("button", { name: "Add to the specification" }).click();
    await designer.waitForURL(/\/specification#fixed-items$/);
    await designer.getByText(item).first().waitFor();
    await snap(designer, "spec-current");

    await designer.getByRole("button", { name: /^Issue revision [A-Z]+…$/ }).click();
    const confirm = designer.getByRole("button", { name: /^Issue revision [A-Z]+$/ });
    letter = ((await confirm.textContent()) ?? "").replace("Issue revision ", "").trim();
    expect(letter).toMatch(/^[A-Z]+$/);
    await confirm.click();
    await designer.waitForURL(/\/specification\/revisions\/[^/]+$/);
    await designer.getByRole("heading", { level: 1, name: `Revision ${letter}` }).waitFor();
    const hash = await designer.locator("[data-hash]").getAttribute("data-hash");
    expect(hash).toMatch(/^[0-9a-f]{64}$/);
    await expect(designer.getByText("Checks out").isVisible()).resolves.toBe(true);
    await expect(designer.getByText(item).first().isVisible()).resolves.toBe(true);
    await snap(designer, "spec-revision-issued");
  });

  it("prints cleanly with its cautions", async () => {
    const url = new URL(designer.url());
    const revisionId = url.pathname.split("/").at(-1) ?? "";
    await designer.goto(`${project}/specification/print?revision=${revisionId}&paper=letter`);
    await designer.emulateMedia({ media: "print" });
    await expect(designer.getByRole("navigation", { name: "Project" }).isVisible()).resolves.toBe(false);
    await expect(designer.getByRole("button", { name: "Print" }).isVisible()).resolves.toBe(false);
    await expect(designer.getByText("Cutting natural stone.").isVisible()).resolves.toBe(true);
    await expect(designer.getByText(/^Guidance only\./).first().isVisible()).resolves.toBe(true);
    await snap(designer, "spec-print-letter");
    await designer.emulateMedia({ media: "screen" });
  });

  it("the stone supplier, on a phone, opens the e-mailed link, sees only their lines and acknowledges", async () => {
    revisionLink = await waitForRevisionMail("stone@demo.example", `Revision ${letter} issued`);
    const phone = await newPage(browser, "phone");
    await phone.goto(revisionLink);
    await phone.waitForURL(/\/sign-in\?callbackUrl=/);
    await signInWithLink(phone, "stone@demo.example");
    await phone.waitForURL(/\/supplier\/revisions\/[^/]+$/);
    await phone.getByRole("heading", { level: 1, name: `Revision ${letter}` }).waitFor();

    const cards = phone.locator("#your-lines + ul > li");
    const titles = await cards.locator("h3").allTextContents();
    expect(titles).toEqual(expect.arrayContaining(["Benchtop", "Laundry benchtop", item]));
    const body = (await phone.locator("main").textContent()) ?? "";
    for (const other of ["Hearthline", "Lanternfield", "Groundswell", "Induction Cooktop", "Wall oven"]) expect(body).not.toContain(other);
    await expect(phone.getByText(item).first().isVisible()).resolves.toBe(true);
    await snap(phone, "spec-supplier-phone");

    await phone.getByRole("button", { name: `I've received revision ${letter}` }).click();
    await phone.getByText(`You acknowledged revision ${letter}`).waitFor();

    const card = cards.filter({ has: phone.getByRole("heading", { name: item }) });
    const today = new Date().toISOString().slice(0, 10);
    await card.getByLabel("Ordered on").fill(today);
    await card.getByRole("button", { name: "Save dates" }).click();
    await card.getByText("Saved.").waitFor();
    await card.getByText("Ordered", { exact: true }).waitFor();
    await snap(phone, "spec-supplier-acknowledged-phone");
    const tap = await phone.getByRole("button", { name: "Save dates" }).first().boundingBox();
    expect(tap?.height ?? 0).toBeGreaterThanOrEqual(44);
  }, 120_000);

  it("the designer sees the acknowledgement in the hand-off", async () => {
    await designer.goto(`${project}/handoff`);
    const stone = designer.getByRole("region", { name: "Ridgeline Stoneworks" });
    await stone.getByText(`Acknowledged revision ${letter}`, { exact: true }).waitFor();
    await snap(designer, "spec-handoff");
  });
});
