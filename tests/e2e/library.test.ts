import type { Browser } from "playwright-core";
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launch, newPage, signInWithPassword, snap } from "./support/browser";

let browser: Browser;
beforeAll(async () => {
  browser = await launch();
});
afterAll(async () => {
  await browser?.close();
});

/** A sample photo of a warm sage finish with a darker vein, as a JPEG from a phone would be. */
async function makeSamplePhoto(): Promise<Buffer> {
  const width = 640;
  const height = 480;
  const raw = Buffer.alloc(width * height * 3);
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) raw.set(Math.abs(x - y) < 12 ? [96, 104, 84] : [150, 160, 120], (y * width + x) * 3);
  }
  return sharp(raw, { raw: { width, height, channels: 3 } }).jpeg({ quality: 92 }).toBuffer();
}

describe("the materials library", () => {
  it("a designer drops a photo, keeps its measured colour and saves a finish", async () => {
    const page = await newPage(browser);
    await signInWithPassword(page, "designer@demo.example");
    await page.waitForURL(/\/studio$/);
    await page.goto("/studio/library");
    await expect(page.getByRole("heading", { level: 1, name: "Library" }).isVisible()).resolves.toBe(true);
    await snap(page, "library-table");

    await page.getByRole("link", { name: "Add a finish" }).click();
    await page.waitForURL(/\/studio\/library\/new$/);
    const name = `Sage Glazed Tile ${Date.now()}`;
    await page.getByLabel("Name", { exact: true }).fill(name);
    await page.getByLabel("Category").selectOption("tile");
    await page.getByLabel("Supplier (optional)").selectOption({ label: "Kiln Lane Tiles & Bathware" });
    await page.getByLabel("Product code (optional)").fill("KL-SG-77");

    // Dropping a file is setting the dropzone's own file input, as react-dropzone reads it.
    await page.getByTestId("photo-dropzone").locator("input[type=file]").setInputFiles({
      name: "sage sample.jpg",
      mimeType: "image/jpeg",
      buffer: await makeSamplePhoto(),
    });
    const measured = page.getByRole("radio", { name: /Measured colour/ });
    await measured.waitFor({ state: "attached", timeout: 30_000 });
    await measured.check();
    await expect(page.getByRole("radio", { name: /Measured from the sample photo/ }).isChecked()).resolves.toBe(true);
    await expect(page.getByText(/LRV used: [\d.]+, measured from the photo/).isVisible()).resolves.toBe(true);

    await page.getByLabel("Cost per unit, excluding GST/tax").fill("129.00");
    await page.getByLabel("Lead time (days)").fill("35");
    await page.getByLabel(/Slip resistance in wet areas/).check();
    // The preview comes through the authenticated photo route; wait for it before the screenshot.
    await page.waitForFunction(() => [...document.images].some((img) => img.alt === "The sample photo" && img.complete && img.naturalWidth > 0));
    await snap(page, "library-new-finish-with-photo");
    await page.getByRole("button", { name: "Save finish" }).click();

    await page.waitForURL(/\/studio\/library\/[0-9a-f-]{36}\?added=1$/);
    await expect(page.getByText("Finish added to the library.").isVisible()).resolves.toBe(true);
    await expect(page.getByRole("heading", { level: 1, name }).isVisible()).resolves.toBe(true);
    await snap(page, "library-finish-saved");

    const id = new URL(page.url()).pathname.split("/").pop() ?? "";
    const saved = (await (await page.request.get(`/api/finishes/${id}`)).json()) as Record<string, unknown>;
    expect(saved).toMatchObject({ name, category: "tile", colourSource: "photo", lrvSource: "photo", productCode: "KL-SG-77", unitPriceCents: 12900, cautions: ["slip-wet-areas"] });
    expect(saved.imageId).toEqual(expect.any(String));
    // The photo's ground is rgb(150 160 120) ≈ #96a078; the vein pulls the median only a little. [test construction]
    const [L] = saved.lab as number[];
    expect(L).toBeGreaterThan(58);
    expect(L).toBeLessThan(68);
    const photo = await page.request.get(`/api/uploads/${String(saved.imageId)}/400`);
    expect(photo.status()).toBe(200);
    expect(photo.headers()["content-type"]).toBe("image/webp");
  });

  it("the table fits a phone as a list", async () => {
    const page = await newPage(browser, "phone");
    await signInWithPassword(page, "designer@demo.example");
    await page.waitForURL(/\/studio$/);
    await page.goto("/studio/library?category=stone");
    await expect(page.getByRole("link", { name: "Saltbush Limestone" }).first().isVisible()).resolves.toBe(true);
    await snap(page, "library-table-phone");
  });
});
