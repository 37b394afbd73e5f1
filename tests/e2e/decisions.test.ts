import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { baseUrl, launch, newPage, signInWithLink, signInWithPassword, snap } from "./support/browser";

// The whole client flow on a phone, from the caught "decision waiting" e-mail to a locked
// decision the designer sees. The designer opens a fresh decision first, so the test depends on
// no other test's state and leaves the demo's own decisions as they were.
let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

type Caught = { to: string[]; subject: string; links: string[]; receivedAt: string };

async function waitForDecisionMail(email: string, title: string, since: number): Promise<string> {
  for (let i = 0; i < 80; i++) {
    const messages = (await (await fetch(`${baseUrl}/api/dev/mail?to=${encodeURIComponent(email)}`)).json()) as Caught[];
    const link = messages
      .filter((m) => Date.parse(m.receivedAt) >= since && m.subject.includes(title))
      .flatMap((m) => m.links)
      .find((l) => l.includes("/client/decisions/"));
    if (link) return link;
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`no "${title}" e-mail reached ${email}`);
}

function inDays(days: number) {
  const d = new Date();
  d.setUTCDate(d.getUTCDate() + days);
  return d.toISOString().slice(0, 10);
}

const title = `Open shelf timber ${Date.now().toString(36)}`;
let designer: Page;
let decisionPath = "";

describe("a client decides on a phone", () => {
  it("the designer opens a decision with two options; the clients are e-mailed", async () => {
    designer = await newPage(browser);
    await signInWithPassword(designer, "designer@demo.example");
    await designer.waitForURL(/\/studio$/);
    await designer.goto("/studio/projects/demo-project-marrow/decisions/new");
    await designer.getByLabel("What is being decided").fill(title);
    await designer.getByLabel("Allowance in the contract ($)").fill("1,200");
    await designer.getByLabel("Client to decide by").fill(inDays(30));
    const names = designer.getByLabel("Name the client sees");
    // These prices are set by hand (a price is otherwise worked out from the finishes).
    const byHand = designer.getByLabel("Set this price by hand");
    const prices = designer.getByLabel("Price set by hand, including GST ($)");
    const finishes = designer.getByLabel("Finish", { exact: true });
    await names.nth(0).fill("Natural oak");
    await finishes.nth(0).selectOption({ label: "Natural Oak Veneer · TJ-VN-201" });
    await byHand.nth(0).check();
    await prices.nth(0).fill("980");
    await names.nth(1).fill("Walnut");
    await finishes.nth(1).selectOption({ label: "Walnut Veneer · TJ-VN-230" });
    await byHand.nth(1).check();
    await prices.nth(1).fill("1340.00");
    await expect(designer.getByText(/Suggested order-by date/).isVisible()).resolves.toBe(true);
    await snap(designer, "decision-new-designer");
    await designer.getByRole("button", { name: "Open the decision" }).click();
    await designer.waitForURL(/\/decisions\/[0-9a-f-]{36}$/);
    decisionPath = new URL(designer.url()).pathname;
    await designer.getByRole("heading", { level: 1, name: title }).waitFor();
  }, 180_000);

  it("from the e-mail, the client signs in, compares, picks and approves with the confirmation", async () => {
    const link = await waitForDecisionMail("client@demo.example", title, Date.now() - 60_000);
    const page = await newPage(browser, "phone");
    await page.goto(link);
    await page.waitForURL(/\/sign-in\?callbackUrl=/);
    await signInWithLink(page, "client@demo.example");
    await page.waitForURL(/\/client\/decisions\/[0-9a-f-]{36}$/);

    // Compare: both options, their prices against the $1,200 allowance, side by side at a glance.
    await page.getByRole("heading", { level: 1, name: title }).waitFor();
    await expect(page.getByRole("navigation", { name: "The options at a glance" }).isVisible()).resolves.toBe(true);
    await expect(page.getByText("$220.00 under the allowance").isVisible()).resolves.toBe(true);
    await expect(page.getByText("$140.00 over the allowance").isVisible()).resolves.toBe(true);
    await snap(page, "decision-client-compare-phone");

    // Pick the walnut, then change mind to the oak.
    const card = (name: string) => page.locator("article", { has: page.getByRole("heading", { name, exact: true }) });
    await card("Walnut").getByRole("button", { name: "Pick this one" }).click();
    await card("Walnut").getByText("Current pick").waitFor();
    await card("Natural oak").getByRole("button", { name: "Pick this one" }).click();
    await card("Natural oak").getByText("Current pick").waitFor();
    await snap(page, "decision-client-picked-phone");

    // The confirmation restates the option, its price and the difference, and what locking means.
    await card("Natural oak").getByRole("link", { name: "Approve this option…" }).click();
    await page.getByRole("heading", { level: 1, name: "Approve “Natural oak”?" }).waitFor();
    const summary = page.getByRole("region", { name: "What you are approving" });
    await expect(summary.getByText("Natural Oak Veneer").isVisible()).resolves.toBe(true);
    await expect(summary.getByText("$980.00").isVisible()).resolves.toBe(true);
    await expect(summary.getByText("−$220.00").isVisible()).resolves.toBe(true);
    await expect(page.getByText("Approving locks this decision").isVisible()).resolves.toBe(true);
    await snap(page, "decision-client-confirm-phone");
    await page.getByRole("button", { name: "Yes, approve and lock" }).click();

    await page.waitForURL(/\?approved=1$/);
    const banner = page.getByTestId("locked-banner");
    await banner.waitFor();
    await expect(banner.getByText("Approved and locked: Natural oak").isVisible()).resolves.toBe(true);
    await expect(banner.getByText(/Approved by Noor Haddad/).isVisible()).resolves.toBe(true);
    await expect(page.getByRole("button", { name: "Pick this one" }).count()).resolves.toBe(0);
    await snap(page, "decision-client-locked-phone");

    // Locked means locked, whatever the screen: the API refuses another pick.
    const id = decisionPath.split("/").pop() ?? "";
    const refused = await page.request.post(`/api/decisions/${id}/choice`, { data: { optionId: "anything" }, headers: { origin: baseUrl } });
    expect(refused.status()).toBe(409);
  }, 180_000);

  it("the designer sees it locked, with who approved it", async () => {
    await designer.goto(decisionPath);
    await designer.getByText("Approved and locked: Natural oak").waitFor();
    await expect(designer.getByRole("link", { name: "Edit" }).count()).resolves.toBe(0);
    await expect(designer.getByText(/Approved by Noor Haddad/).first().isVisible()).resolves.toBe(true);
    await snap(designer, "decision-designer-locked");
  }, 120_000);
});
