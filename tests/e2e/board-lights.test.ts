import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { paintSurround } from "@/lib/boards/lights";
import type { BoardView } from "@/lib/boards/types";
import { computeLightXy, LIGHTS } from "@/lib/colour";
import { launch, newPage, signInWithLink, signInWithPassword, snap } from "./support/browser";

// The demo kitchen board under each light, as the designer and as the client on a phone: the
// lamp notice names the lamp's white point and the method, every verdict is the daylight one,
// swatches and their surround are painted with the board JSON's colours, and a light that fails
// to load says so and leaves the previous light on screen. Screenshots in tests/artifacts/.
const BOARD = "demo-board-kitchen-a";
const DESIGNER_PATH = `/studio/projects/demo-project-marrow/boards/${BOARD}`;
const CLIENT_PATH = `/client/boards/${BOARD}`;
const ORDER = ["daylight", "2700", "3000", "4000"];

let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

const rgb = (hex: string) => `rgb(${[1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16)).join(", ")})`;

async function readBoard(page: Page, cct: number): Promise<BoardView> {
  const res = await page.request.get(`/api/boards/${BOARD}?cct=${cct}`);
  expect(res.status()).toBe(200);
  return (await res.json()) as BoardView;
}

/** Picks a light and waits until its colours are on screen. */
async function pick(page: Page, id: string) {
  const light = LIGHTS.find((l) => l.id === id);
  if (!light) throw new Error(`no light ${id}`);
  await page.locator("label", { hasText: light.label }).click();
  if (id === "daylight") await page.locator("[data-lamp-method]").waitFor({ state: "detached" });
  else await page.locator("[data-lamp-method]", { hasText: `x ${computeLightXy(light.cct)[0].toFixed(4)}` }).waitFor();
  await page.waitForFunction(() => !document.querySelector("fieldset[aria-busy]"));
  return light;
}

async function paintedColours(page: Page, selector: string): Promise<string[]> {
  return page.locator(selector).evaluateAll((els) => els.map((el) => getComputedStyle(el).backgroundColor));
}

async function expectLampNotice(page: Page, id: string, cct: number) {
  const notice = page.locator("[data-lamp-notice]");
  if (id === "daylight") {
    await expect(notice.count()).resolves.toBe(0);
    return;
  }
  await expect(notice.textContent()).resolves.toContain("Without the lamp's spectrum, Mottle can't show a real change between finishes under this light");
  const [x, y] = computeLightXy(cct);
  const method = (await page.locator("[data-lamp-method]").textContent()) ?? "";
  expect(method).toContain(`x ${x.toFixed(4)}, y ${y.toFixed(4)}`);
  expect(method).toMatch(/Bradford/);
  expect(method).toMatch(/CIE 15/);
}

describe("the designer's board under each light", () => {
  let page: Page;
  let daylightVerdicts: (string | null)[] = [];

  it("signs in and opens the kitchen board", async () => {
    page = await newPage(browser);
    await signInWithPassword(page, "designer@demo.example");
    await page.waitForURL(/\/studio$/);
    await page.goto(DESIGNER_PATH);
    await page.locator("[data-board-canvas]").waitFor();
    daylightVerdicts = await page.locator("ol[aria-label='Pairs, worst first'] > li").evaluateAll((els) => els.map((el) => el.getAttribute("data-verdict")));
    expect(daylightVerdicts.length).toBeGreaterThan(0);
  });

  it.each(ORDER)("under %s: the daylight verdicts, the JSON's colours on an adapted surround, and the notice", async (id) => {
    const light = await pick(page, id);
    const view = await readBoard(page, light.cct);
    const verdicts = await page.locator("ol[aria-label='Pairs, worst first'] > li").evaluateAll((els) => els.map((el) => el.getAttribute("data-verdict")));
    expect(verdicts).toEqual(daylightVerdicts);
    expect(view.checks.every((c) => !c.changed)).toBe(true);
    for (const item of view.items) {
      const [painted] = await paintedColours(page, `[data-item-id="${item.id}"] [data-swatch-colour]`);
      expect(painted).toBe(rgb(item.finish.tint));
    }
    const surround = await page.locator("[data-board-canvas]").evaluate((el) => getComputedStyle(el).backgroundColor);
    expect(surround).toBe(rgb(paintSurround(light.cct)));
    await expectLampNotice(page, id, light.cct);
    if (id !== "daylight") await expect(page.locator("[data-lamp-checks]").textContent()).resolves.toContain("Same verdicts as in daylight");
    await snap(page, `board-lights-designer-${id}`);
  });

  it("says so when a light fails to load, and keeps the previous light selected and shown", async () => {
    const before = await paintedColours(page, "[data-board-canvas] [data-swatch-colour]");
    await page.route(`**/api/boards/${BOARD}?cct=3000`, (route) => route.fulfill({ status: 503, contentType: "application/json", body: JSON.stringify({ error: "Mottle is busy." }) }));
    await page.locator("label", { hasText: "Warm white 3000 K" }).click();
    const problem = page.locator("[data-light-problem]");
    await problem.waitFor();
    await expect(problem.textContent()).resolves.toMatch(/could not be loaded under warm white 3000 K\. Mottle is busy\. It is still shown under cool white 4000 K\./);
    await expect(page.locator('input[type="radio"][value="4000"]').isChecked()).resolves.toBe(true);
    await expect(page.locator('input[type="radio"][value="3000"]').isChecked()).resolves.toBe(false);
    await expect(paintedColours(page, "[data-board-canvas] [data-swatch-colour]")).resolves.toEqual(before);
    await expectLampNotice(page, "4000", 4000);
    await snap(page, "board-lights-designer-failed-3000");
    await page.unroute(`**/api/boards/${BOARD}?cct=3000`);
  });
});

describe("the client's board on a phone under each light", () => {
  let page: Page;
  let daylightVerdicts: (string | null)[] = [];

  it("signs in by e-mailed link and opens the board", async () => {
    page = await newPage(browser, "phone");
    await page.goto("/sign-in");
    await signInWithLink(page, "client2@demo.example");
    await page.goto(CLIENT_PATH);
    await page.locator("[data-board-picture]").waitFor();
    daylightVerdicts = await page.locator("#meet-title ~ ol > li").evaluateAll((els) => els.map((el) => el.getAttribute("data-verdict")));
    expect(daylightVerdicts.length).toBeGreaterThan(0);
  });

  it.each(ORDER)("under %s: the same verdicts, the JSON's colours and the notice", async (id) => {
    const light = await pick(page, id);
    const view = await readBoard(page, light.cct);
    const verdicts = await page.locator("#meet-title ~ ol > li").evaluateAll((els) => els.map((el) => el.getAttribute("data-verdict")));
    expect(verdicts).toEqual(daylightVerdicts);
    const painted = await paintedColours(page, "[data-board-picture] [data-swatch-colour]");
    expect(painted).toEqual(view.items.map((i) => rgb(i.finish.tint)));
    const surround = await page.locator("[data-board-picture]").evaluate((el) => getComputedStyle(el).backgroundColor);
    expect(surround).toBe(rgb(paintSurround(light.cct)));
    await expect(page.getByText("Under this light the verdict changes").count()).resolves.toBe(0);
    await expectLampNotice(page, id, light.cct);
    await snap(page, `board-lights-client-${id}`);
  });
});
