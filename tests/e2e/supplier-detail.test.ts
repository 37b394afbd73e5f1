import type { Browser, Page } from "playwright-core";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { launch, newPage, signInWithLink, signInWithPassword, snap } from "./support/browser";

// What a supplier needs to act without phoning the studio, on a phone (390 × 844): the site, the
// install date, whom to ask, and each finish's surface, format and photo; never a price or another
// supplier's line. Then the studio home's list of what is waiting on the studio.
const revision = "/supplier/revisions/demo-revision-a";

let browser: Browser;
let designer: Page;

beforeAll(async () => {
  browser = await launch();
  designer = await newPage(browser);
  await designer.goto("/studio");
  await signInWithPassword(designer, "designer@demo.example");
  await designer.waitForURL(/\/studio$/);
  // Give the benchtop's stone a photo, as a designer would from the library (upload, then attach).
  const attached = await designer.evaluate(async () => {
    const canvas = document.createElement("canvas");
    canvas.width = 240;
    canvas.height = 240;
    const ctx = canvas.getContext("2d");
    if (!ctx) return 0;
    ctx.fillStyle = "#d9d2c3";
    ctx.fillRect(0, 0, 240, 240);
    ctx.strokeStyle = "#b9ae99";
    ctx.lineWidth = 6;
    ctx.beginPath();
    ctx.moveTo(0, 180);
    ctx.bezierCurveTo(80, 120, 150, 210, 240, 60);
    ctx.stroke();
    const blob = await new Promise<Blob | null>((resolve) => canvas.toBlob(resolve, "image/png"));
    if (!blob) return 0;
    const form = new FormData();
    form.set("file", new File([blob], "saltbush.png", { type: "image/png" }));
    const uploaded = await fetch("/api/uploads", { method: "POST", body: form });
    const { id } = (await uploaded.json()) as { id: string };
    const patched = await fetch("/api/finishes/demo-finish-saltbush", {
      method: "PATCH",
      headers: { "Content-Type": "application/json" },
      body: JSON.stringify({ imageId: id }),
    });
    return patched.status;
  });
  expect(attached).toBe(200);
});
afterAll(async () => {
  await browser?.close();
});

describe("a supplier's lines, without a phone call", () => {
  it("shows the site, install date, contact and each finish's surface, format and photo, and nothing else", async () => {
    const phone = await newPage(browser, "phone");
    await phone.goto(revision);
    await signInWithLink(phone, "stone@demo.example");
    await phone.waitForURL(new RegExp(`${revision}$`));
    await phone.getByRole("heading", { level: 1, name: "Revision A" }).waitFor();
    const text = (await phone.locator("main").innerText()).replace(/\s+/g, " ");
    for (const wanted of ["14 Marrow Street, Eastbrook", "12 Apr 2027", "Rafe Lindqvist, Fernleaf Interiors", "designer@demo.example", "Honed, 20 mm slab, 3200 × 1600", "Matt, 12 mm slab, 3200 × 1600", "RS-LM-204", "Kitchen · Perimeter and island"]) {
      expect(text).toContain(wanted);
    }
    const html = await phone.content();
    // The whole document, including the data the page hands its scripts; "$" on screen only (the RSC payload uses it).
    for (const secret of ["Hearthline", "Lanternfield", "Groundswell", "Cooktop", "allowance", "Allowance", "price", "Cents"]) expect(html).not.toContain(secret);
    expect(text).not.toContain("$");
    const photo = phone.getByRole("img", { name: "Photo of Saltbush Limestone" });
    await photo.waitFor();
    expect(await photo.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth > 0)).toBe(true);
    await snap(phone, "supplier-revision-detail-phone");
    await phone.context().close();
  });
});

describe("the studio home", () => {
  it("lists what is waiting on the studio, each linking to where it is dealt with", async () => {
    await designer.goto("/studio");
    const list = designer.getByRole("list", { name: "Waiting on the studio" });
    await list.waitFor();
    const text = await list.innerText();
    expect(text).toContain("Price the variation to Benchtop");
    expect(text).toContain("The specification changed since revision A");
    expect(text).toContain("Hearthline Appliances hasn't acknowledged revision A");
    await snap(designer, "studio-home-attention");
    await designer.getByRole("link", { name: "Price the variation to Benchtop" }).click();
    await designer.waitForURL(/\/decisions\/demo-decision-kitchen-benchtop\/variations\/demo-variation-kb$/);
  });
});
