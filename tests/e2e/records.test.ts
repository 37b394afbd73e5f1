import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launch, newPage, signInWithLink, signInWithPassword, snap } from "./support/browser";

// Records that tell the truth, on a phone (390 × 844): the locked laundry benchtop names who
// approved what and when; the activity log holds the demo's story; the stonemason sees that the
// laundry line in revision A was overtaken by a variation and can't order it.
const project = "/studio/projects/demo-project-marrow";
const laundry = "demo-decision-laundry-benchtop";

let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

async function signedIn(path: string, sign: (page: Page) => Promise<void>) {
  const page = await newPage(browser, "phone");
  await page.goto(path);
  await sign(page);
  await page.waitForURL((url) => url.pathname === path.split("?")[0]);
  return page;
}

describe("records on a phone", () => {
  it("the designer sees the laundry benchtop's approvals credited truly", async () => {
    const page = await signedIn(`${project}/decisions/${laundry}`, (p) => signInWithPassword(p, "designer@demo.example"));
    await expect.poll(() => page.getByTestId("locked-by").textContent()).toMatch(/variation approved by Callum Haddad on 26 Nov 2026/);
    expect(await page.getByTestId("first-approved-by").textContent()).toMatch(/Graphite Porcelain Slab.*Noor Haddad on 18 Nov 2026/);
    await snap(page, "records-laundry-studio");

    await page.goto(`${project}/activity`);
    await page.getByTestId("activity-log").waitFor();
    expect(await page.getByTestId("activity-log").textContent()).toContain("added 10 swatches and paired 6 pairs of swatches");
    await snap(page, "records-activity");
    await page.goto(`${project}/specification`);
    await page.getByTestId("changed-lines").waitFor();
    await snap(page, "records-spec-changed-line");
    await page.context().close();
  });

  it("the client sees the same facts", async () => {
    const page = await signedIn(`/client/decisions/${laundry}`, (p) => signInWithLink(p, "client2@demo.example"));
    await expect.poll(() => page.getByTestId("locked-by").textContent()).toMatch(/Callum Haddad on 26 Nov 2026/);
    await snap(page, "records-laundry-client");
    await page.context().close();
  });

  it("the stonemason sees the overtaken line, with no order fields on it", async () => {
    const page = await signedIn("/supplier/revisions/demo-revision-a", (p) => signInWithLink(p, "stone@demo.example"));
    const line = page.locator("li[data-superseded]");
    await line.waitFor();
    expect(await line.textContent()).toMatch(/Changed: a new revision is coming/);
    expect(await line.locator("input").count()).toBe(0);
    await line.scrollIntoViewIfNeeded();
    await snap(page, "records-supplier-superseded");
    await page.context().close();
  });
});
