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

// [published: IEC 61966-2-1 sRGB transfer functions]
const decode = (v: number): number => (v <= 0.04045 ? v / 12.92 : ((v + 0.055) / 1.055) ** 2.4);
const encode = (v: number): number => (v <= 0.0031308 ? v * 12.92 : 1.055 * v ** (1 / 2.4) - 0.055);

const width = 640;
const height = 480;
const card = { left: 40, top: 40, width: 160, height: 120 };

/** Oak (#b08a5e, LRV ≈ 28) beside an 18% grey card, 30% under-exposed, as an ideal linear camera. */
async function makeOakWithCard(): Promise<Buffer> {
  const oak = [0xb0, 0x8a, 0x5e].map((v) => decode(v / 255));
  const raw = Buffer.alloc(width * height * 3);
  for (let i = 0; i < width * height; i++) {
    const x = i % width;
    const y = Math.floor(i / width);
    const inCard = x >= card.left && x < card.left + card.width && y >= card.top && y < card.top + card.height;
    (inCard ? [0.18, 0.18, 0.18] : oak).forEach((v, c) => (raw[i * 3 + c] = Math.round(encode(v * 0.7) * 255)));
  }
  return sharp(raw, { raw: { width, height, channels: 3 } }).png().toBuffer();
}

describe("measuring a photo against a grey card", () => {
  it("a designer boxes the 18% card, and the section says what was corrected and how far off it may be", async () => {
    const page = await newPage(browser);
    await signInWithPassword(page, "designer@demo.example");
    await page.waitForURL(/\/studio$/);
    await page.goto("/studio/library/new");
    await page.getByTestId("photo-dropzone").locator("input[type=file]").setInputFiles({ name: "oak and card.png", mimeType: "image/png", buffer: await makeOakWithCard() });
    await page.getByRole("radio", { name: /Measured colour/ }).waitFor({ state: "attached", timeout: 30_000 });
    await expect(page.getByText(/No card, so the camera chose the exposure/).isVisible()).resolves.toBe(true);

    await page.waitForFunction(() => [...document.images].some((img) => img.alt === "The sample photo" && img.complete && img.naturalWidth > 0));
    // Mouse positions are in the viewport: bring the photo into it first.
    await page.getByAltText("The sample photo").scrollIntoViewIfNeeded();
    const photo = await page.getByAltText("The sample photo").boundingBox();
    if (!photo) throw new Error("the photo is not shown");
    const at = (x: number, y: number) => [photo.x + (x / width) * photo.width, photo.y + (y / height) * photo.height] as const;
    // Inside the card by a margin, as a designer would draw it.
    const [x0, y0] = at(card.left + 20, card.top + 20);
    const [x1, y1] = at(card.left + card.width - 20, card.top + card.height - 20);
    await page.mouse.move(x0, y0);
    await page.mouse.down();
    await page.mouse.move(x1, y1, { steps: 5 });
    await page.mouse.up();

    await expect(page.getByRole("radio", { name: "18% grey card" }).isChecked()).resolves.toBe(true);
    await page.getByRole("button", { name: "Measure with the card" }).click();
    await page.getByText(/Cast and exposure corrected with your 18% card/).waitFor({ timeout: 30_000 });
    // LRV of #b08a5e is 28.1 [CIE Y of the sRGB colour, IEC 61966-2-1]; under-exposed it read about 20 before.
    const measured = await page.getByRole("radio", { name: /Measured colour/ }).locator("xpath=..").innerText();
    const lrv = Number(/LRV ([\d.]+)/.exec(measured)?.[1]);
    expect(Math.abs(lrv - 28.1)).toBeLessThan(0.6);
    await snap(page, "photo-section-grey-card");
  });
});
