import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { assessPair, underLight } from "@/lib/colour";
import type { BoardView } from "@/lib/boards/types";
import { VERDICT_WORDS } from "@/lib/boards/words";
import { baseUrl, launch, newPage, signInWithLink, signInWithPassword, snap } from "./support/browser";

// A designer builds a small board of their own (so the demo board stays as seeded), moves a
// swatch with the keyboard, pairs two swatches and reads the check; the verdict shown is compared
// with lib/colour's assessPair on the same finishes, in daylight and under 2700 K.
let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

const boardName = `Laundry test ${Date.now().toString(36)}`;
let designer: Page;
let boardId = "";

async function readBoard(page: Page, cct = 6504): Promise<BoardView> {
  const res = await page.request.get(`/api/boards/${boardId}?cct=${cct}`);
  expect(res.status()).toBe(200);
  return (await res.json()) as BoardView;
}

async function place(page: Page, search: string, count: number) {
  await page.getByLabel("Search the library").fill(search);
  const result = page.locator("[data-finish-id]").filter({ hasText: search }).first();
  await result.waitFor();
  await result.getByRole("button", { name: /^Place/ }).click();
  await page.waitForFunction(
    (n) => document.querySelectorAll("[data-item-id]").length === n && !document.querySelector('[data-item-id^="pending-"]'),
    count,
  );
}

/** What lib/colour says about the one pair on the board, under this light. */
function expectedFor(view: BoardView, cct: number) {
  const [pair] = view.pairs;
  const a = view.items.find((i) => i.id === pair?.itemAId)?.finish;
  const b = view.items.find((i) => i.id === pair?.itemBId)?.finish;
  if (!pair || !a || !b) throw new Error("the board should hold one pair of two swatches");
  const seen = (lab: BoardView["items"][number]["finish"]["lab"]) => (cct === 6504 ? lab : underLight(lab, cct));
  return assessPair({ a: { lab: seen(a.lab), lrv: a.lrv }, b: { lab: seen(b.lab), lrv: b.lrv }, intent: pair.intent, accessRelevant: pair.accessRelevant });
}

describe("a designer composes a sample board", () => {
  it("starts a board for the laundry", async () => {
    designer = await newPage(browser);
    await signInWithPassword(designer, "designer@demo.example");
    await designer.waitForURL(/\/studio$/);
    await designer.goto("/studio/projects/demo-project-marrow/boards");
    await designer.getByLabel("Room", { exact: true }).selectOption({ label: "Laundry" });
    await designer.getByLabel("Board name").fill(boardName);
    await designer.getByRole("button", { name: "Start the board" }).click();
    await designer.waitForURL(/\/boards\/[^/]+$/);
    boardId = designer.url().split("/").pop() ?? "";
    await expect(designer.getByRole("heading", { level: 1, name: boardName }).isVisible()).resolves.toBe(true);
  });

  it("places two finishes from the library", async () => {
    await place(designer, "Chalk White Polyurethane", 1);
    await place(designer, "Night Basalt", 2);
    const view = await readBoard(designer);
    expect(view.items.map((i) => [i.label, i.finish.name])).toEqual([
      ["Base cabinets", "Chalk White Polyurethane"],
      ["Benchtop", "Night Basalt"],
    ]);
  });

  it("moves a swatch with the keyboard, on the grid", async () => {
    const before = (await readBoard(designer)).items[0];
    const swatch = designer.locator(`[data-item-id="${before?.id}"]`);
    await swatch.focus();
    await designer.keyboard.press("ArrowDown");
    await designer.keyboard.press("Shift+ArrowDown");
    await expect.poll(async () => (await readBoard(designer)).items[0]?.y, { timeout: 30_000 }).toBe((before?.y ?? 0) + 20 + 100);
    await expect(swatch.getAttribute("aria-label")).resolves.toContain(`At ${before?.x}, ${(before?.y ?? 0) + 120}`);
  });

  it("pairs the two swatches and shows the check lib/colour gives", async () => {
    await designer.getByLabel("This swatch").selectOption({ label: "Benchtop (Night Basalt)" });
    await designer.getByLabel("meets this one").selectOption({ label: "Base cabinets (Chalk White Polyurethane)" });
    await designer.getByLabel("Contrast").check();
    await designer.getByLabel(/Matters for access \(floor/).check();
    await designer.getByRole("button", { name: "Add the pair", exact: true }).click();
    const card = designer.locator("ol[aria-label='Pairs, worst first'] > li").first();
    await card.waitFor();
    await expect.poll(async () => (await readBoard(designer)).pairs.length, { timeout: 30_000 }).toBe(1);
    const view = await readBoard(designer);
    const expected = expectedFor(view, 6504);
    await expect.poll(() => card.getAttribute("data-verdict"), { timeout: 30_000 }).toBe(expected.verdict);
    await expect(card.textContent()).resolves.toContain(VERDICT_WORDS[expected.verdict]);
    await expect(card.textContent()).resolves.toContain(expected.reason);
    expect(Number(await card.locator("data").first().getAttribute("value"))).toBeCloseTo(expected.deltaE, 9);
    await card.getByRole("button", { name: /Show on the board/ }).click();
    await expect(designer.locator("[data-highlighted]").count()).resolves.toBe(2);
    await snap(designer, "boards-designer-daylight");
  });

  it("switches to 2700 K and sees the checks re-run under that light", async () => {
    await designer.getByText("Warm white 2700 K").click();
    await designer.getByText(/Under warm white 2700 K:/).waitFor();
    const view = await readBoard(designer, 2700);
    const expected = expectedFor(view, 2700);
    const card = designer.locator("ol[aria-label='Pairs, worst first'] > li").first();
    await expect(card.getAttribute("data-verdict")).resolves.toBe(expected.verdict);
    expect(Number(await card.locator("data").first().getAttribute("value"))).toBeCloseTo(expected.deltaE, 9);
    await expect(card.textContent()).resolves.toMatch(/daylight/);
    // The swatch on the canvas is painted in the lamp's tint.
    const item = view.items[0];
    const painted = await designer.locator(`[data-item-id="${item?.id}"] [data-swatch-colour]`).first().evaluate((el) => getComputedStyle(el).backgroundColor);
    const hex = item?.finish.tint ?? "";
    const rgb = `rgb(${[1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16)).join(", ")})`;
    expect(painted).toBe(rgb);
    await snap(designer, "boards-designer-2700");
  });

  it("refuses a change based on a stale version, says so and reloads the other tab's work", async () => {
    const view = await readBoard(designer);
    const [base, benchtop] = view.items;
    // Another tab moves the benchtop: the board's version moves on without this page knowing.
    const other = await designer.request.patch(`/api/boards/${boardId}/items/${benchtop?.id}`, {
      data: { version: view.board.version, x: 600, y: 400 },
      headers: { origin: baseUrl },
    });
    expect(other.status()).toBe(200);
    await designer.locator(`[data-item-id="${base?.id}"]`).focus();
    await designer.keyboard.press("ArrowRight");
    await designer.getByText("That change was not saved").waitFor({ timeout: 30_000 });
    await expect
      .poll(async () => designer.locator(`[data-item-id="${benchtop?.id}"]`).getAttribute("aria-label"), { timeout: 30_000 })
      .toContain("At 600, 400");
    const after = await readBoard(designer);
    expect(after.items.find((i) => i.id === base?.id)?.x).toBe(base?.x);
    await snap(designer, "boards-designer-stale");
  });

  it("shows the full demo board at desktop width", async () => {
    await designer.goto("/studio/projects/demo-project-marrow/boards/demo-board-kitchen-a");
    await designer.getByRole("heading", { name: "Checks" }).waitFor();
    await expect(designer.locator("[data-item-id]").count()).resolves.toBe(10);
    await snap(designer, "boards-demo-desktop");
  });
});

describe("a client looks at the board on a phone", () => {
  it("opens the read-only board with the checks in plain words", { timeout: 120_000 }, async () => {
    const page = await newPage(browser, "phone");
    await page.goto("/sign-in");
    await signInWithLink(page, "client@demo.example");
    await page.waitForURL(/\/client$/);
    await page.goto("/client/boards/demo-board-kitchen-a");
    await page.getByRole("heading", { name: "Where finishes meet" }).waitFor();
    await expect(page.getByText("Colour on a screen or in a photo is not the finish.").first().isVisible()).resolves.toBe(true);
    await expect(page.locator("[data-verdict]").count()).resolves.toBe(6);
    // Nothing to edit: no movable swatches, no pair controls, and the API refuses a write.
    await expect(page.locator("[data-item-id]").count()).resolves.toBe(0);
    await expect(page.getByRole("button", { name: "Add the pair", exact: true }).count()).resolves.toBe(0);
    const write = await page.request.post("/api/boards/demo-board-kitchen-a/pairs", {
      data: { version: 1, itemAId: "demo-item-tap", itemBId: "demo-item-splash", intent: "match", accessRelevant: false },
      headers: { origin: baseUrl },
    });
    expect(write.status()).toBe(403);
    const width = await page.evaluate(() => document.documentElement.scrollWidth);
    expect(width).toBeLessThanOrEqual(390);
    await snap(page, "boards-client-phone");
  });
});
