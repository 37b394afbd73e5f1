import { spawn, type ChildProcess } from "node:child_process";
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import type { Browser, BrowserContext, Page } from "playwright-core";
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { migrateDatabase } from "@/db/migrate";
import { startMailCatcher } from "@/lib/mail/catcher";
import { freePort, serveCommand, waitForHttp } from "@/scripts/lib/processes";
import { launch, snap } from "./support/browser";

/**
 * A studio that signed up today, on an EMPTY database (migrations only, no demo seed), through
 * the app's own screens and API: sign-up, a designer, suppliers, finishes, a project, a client and
 * a supplier's contact, a decision the client approves on a phone, a revision the supplier
 * acknowledges and dates, and the corrections a real studio makes afterwards. Its own server,
 * database and mail catcher, so nothing of the demo can help it along.
 */
const dir = mkdtempSync(path.join(tmpdir(), "mottle-new-studio-"));
const stamp = Date.now().toString(36);
const owner = { studio: "Tidewater Interiors", name: "Ines Calloway", email: `ines.${stamp}@tidewater.example`, password: "tidewater-owner-2026" };
const designerPerson = { name: "Rafe Lindqvist", email: `rafe.${stamp}@tidewater.example`, password: "tidewater-designer-2026" };
const clientPerson = { name: "Oona Marsh", email: `oona.${stamp}@homeowner.example` };
const stonePerson = { name: "Teo Brandt", email: `teo.${stamp}@bluegumstone.example` };

let base = "";
let server: ChildProcess | undefined;
let catcher: Awaited<ReturnType<typeof startMailCatcher>> | undefined;
let browser: Browser;
const contexts: BrowserContext[] = [];

type Caught = { to: string[]; subject: string; links: string[]; receivedAt: string };

async function mailLink(email: string, wanted: (link: string) => boolean, since = 0): Promise<string> {
  for (let i = 0; i < 120; i++) {
    const messages = (await (await fetch(`${base}/api/dev/mail?to=${encodeURIComponent(email)}`)).json()) as Caught[];
    const link = messages
      .filter((m) => Date.parse(m.receivedAt) >= since)
      .flatMap((m) => m.links)
      .find(wanted);
    if (link) return link;
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`no matching e-mail reached ${email}`);
}

async function open(device: "desktop" | "phone" = "desktop"): Promise<Page> {
  const context = await browser.newContext({
    viewport: device === "phone" ? { width: 390, height: 844 } : { width: 1280, height: 900 },
    baseURL: base,
  });
  contexts.push(context);
  return context.newPage();
}

/** JSON through the app's own API, with the page's session, the way its screens call it. */
async function api(page: Page, method: string, url: string, data?: unknown) {
  const res = await page.request.fetch(url, { method, data, headers: { origin: base, "content-type": "application/json" } });
  const text = await res.text();
  return { status: res.status(), body: (text ? JSON.parse(text) : {}) as Record<string, unknown> };
}

async function signInByLink(page: Page, email: string) {
  const since = Date.now() - 1000;
  if (!new URL(page.url()).pathname.startsWith("/sign-in")) await page.goto("/sign-in");
  await page.fill("#link-email", email);
  await page.getByRole("button", { name: "Send the link" }).click();
  await page.waitForURL(/\/sign-in\/check-email/);
  await page.goto(await mailLink(email, (l) => l.includes("/api/auth/callback/nodemailer"), since));
}

async function samplePhoto(): Promise<Buffer> {
  // A warm grey stone with a darker vein: rgb(186 176 160) ground. [test construction]
  const width = 480;
  const height = 360;
  const raw = Buffer.alloc(width * height * 3);
  for (let y = 0; y < height; y++) for (let x = 0; x < width; x++) raw.set(Math.abs(x - 2 * y) < 10 ? [120, 112, 100] : [186, 176, 160], (y * width + x) * 3);
  return sharp(raw, { raw: { width, height, channels: 3 } }).jpeg({ quality: 92 }).toBuffer();
}

beforeAll(async () => {
  const databaseUrl = `file:${path.join(dir, "fresh.db")}`;
  const { client } = await migrateDatabase(databaseUrl);
  client.close();
  const port = await freePort();
  base = `http://127.0.0.1:${port}`;
  catcher = await startMailCatcher({ port: await freePort(), dir: path.join(dir, "mail") });
  const [command, args] = serveCommand(port);
  server = spawn(command, args, {
    stdio: ["ignore", "ignore", "inherit"],
    env: {
      ...process.env,
      NODE_ENV: "production",
      APP_URL: base,
      PORT: String(port),
      DATABASE_URL: databaseUrl,
      UPLOADS_DIR: path.join(dir, "uploads"),
      MAIL_CATCHER_DIR: path.join(dir, "mail"),
      SMTP_URL: `smtp://127.0.0.1:${catcher.port}`,
    },
  });
  await waitForHttp(`${base}/api/health`, 60_000, server);
  browser = await launch();
}, 90_000);

afterAll(async () => {
  for (const context of contexts) await context.close().catch(() => undefined);
  await browser?.close();
  server?.kill("SIGKILL");
  await catcher?.close();
  rmSync(dir, { recursive: true, force: true });
});

let ownerPage: Page;
let designerPage: Page;
let projectId = "";
let decisionId = "";
let stoneSupplierId = "";
let benchtopFinishId = "";
let porcelainFinishId = "";
let clientUserId = "";
let clientPage: Page;
let revisionLetter = "";

describe("a studio that signed up today, from an empty database", () => {
  it("the owner signs up and finishes from the e-mailed link; the new studio says what to do first", async () => {
    ownerPage = await open();
    await ownerPage.goto("/sign-up");
    await ownerPage.getByLabel("Studio name").fill(owner.studio);
    await ownerPage.getByLabel("Your name").fill(owner.name);
    await ownerPage.getByLabel("E-mail address").fill(owner.email);
    await ownerPage.getByLabel("Password").fill(owner.password);
    const since = Date.now() - 1000;
    await ownerPage.getByRole("button", { name: "Create the studio" }).click();
    await ownerPage.waitForURL(/\/sign-in\/check-email/);
    await ownerPage.goto(await mailLink(owner.email, (l) => l.includes("/api/auth/callback/nodemailer"), since));
    await ownerPage.waitForURL(/\/studio/);
    await snap(ownerPage, "new-studio-home-empty");
    const projects = await api(ownerPage, "GET", "/api/projects");
    expect(projects.status).toBe(200);
  });

  it("the owner invites a designer, who signs in from the invitation and sets a password", async () => {
    await ownerPage.goto("/studio/team");
    await ownerPage.getByLabel("Name").fill(designerPerson.name);
    await ownerPage.getByLabel("E-mail address").fill(designerPerson.email);
    const since = Date.now() - 1000;
    await ownerPage.getByRole("button", { name: "Send invitation" }).click();
    await ownerPage.getByText("Invitation sent").first().waitFor();
    const invitation = await mailLink(designerPerson.email, (l) => l.startsWith(base), since);
    designerPage = await open();
    await designerPage.goto(invitation);
    await signInByLink(designerPage, designerPerson.email);
    // The invitation brings a new designer to their account page to set a password.
    await designerPage.waitForURL(/\/account/);
    await setOwnPassword(designerPage, designerPerson.password);
    await snap(designerPage, "new-studio-designer-password-set");
    // And the password works on its own, from a fresh browser.
    const fresh = await open();
    await fresh.goto("/sign-in");
    await fresh.fill("#password-email", designerPerson.email);
    await fresh.fill("#password", designerPerson.password);
    await fresh.getByRole("button", { name: "Sign in", exact: true }).click();
    await fresh.waitForURL(/\/studio/);
  });

  it("the designer adds two suppliers with contacts and finishes, one with a photo", async () => {
    const stone = await api(designerPage, "POST", "/api/suppliers", {
      name: "Bluegum Stone Co",
      trade: "stone",
      accountNumber: "TW-0042",
      contacts: [{ name: stonePerson.name, email: stonePerson.email, phone: "0400 000 111", role: "Sales" }],
    });
    expect(stone.status).toBe(201);
    stoneSupplierId = String(stone.body.id);
    const joinery = await api(designerPage, "POST", "/api/suppliers", {
      name: "Saltmarsh Joinery",
      trade: "joinery",
      contacts: [{ name: "Kit Amberley", email: `kit.${stamp}@saltmarsh.example`, role: "Workshop" }],
    });
    expect(joinery.status).toBe(201);

    await designerPage.goto("/studio/library/new");
    await designerPage.getByLabel("Name", { exact: true }).fill("Driftwood Quartzite");
    await designerPage.getByLabel("Category").selectOption("stone");
    await designerPage.getByLabel("Supplier (optional)").selectOption({ label: "Bluegum Stone Co" });
    await designerPage.getByLabel("Product code (optional)").fill("BG-DQ-20");
    await designerPage.getByLabel("Finish (optional)").fill("Honed");
    await designerPage.getByLabel("Size or format (optional)").fill("20 mm slab");
    await designerPage.getByTestId("photo-dropzone").locator("input[type=file]").setInputFiles({ name: "driftwood.jpg", mimeType: "image/jpeg", buffer: await samplePhoto() });
    const measured = designerPage.getByRole("radio", { name: /Measured colour/ });
    await measured.waitFor({ state: "attached", timeout: 30_000 });
    await measured.check();
    await designerPage.getByLabel("Priced per").fill("m²");
    await designerPage.getByLabel(/^Cost per unit/).fill("640");
    await designerPage.getByLabel("Lead time (days)").fill("28");
    await designerPage.getByRole("button", { name: "Save finish" }).click();
    await designerPage.waitForURL(/\/studio\/library\/[0-9a-f-]{36}\?added=1$/);
    benchtopFinishId = new URL(designerPage.url()).pathname.split("/").pop() ?? "";
    await snap(designerPage, "new-studio-finish-with-photo");

    const second = await api(designerPage, "POST", "/api/finishes", {
      name: "Porcelain Ash Slab",
      category: "stone",
      supplierId: stoneSupplierId,
      productCode: "BG-PA-12",
      surface: "Matt",
      format: "12 mm slab",
      unit: "m²",
      unitPriceCents: 42000,
      leadTimeDays: 21,
      colour: { source: "published", value: "#cfcac2" },
      cautions: ["engineered-stone"],
    });
    expect(second.status).toBe(201);
    porcelainFinishId = String(second.body.id);
  }, 120_000);

  it("the designer creates a project with rooms and invites a client and the stonemason's contact", async () => {
    await designerPage.goto("/studio/projects/new");
    await designerPage.getByLabel("Project name").fill("Kestrel Lane cottage");
    await designerPage.getByLabel("Site address (optional)").fill("14 Kestrel Lane, Fernbrook");
    await designerPage.getByLabel("Target install date (optional)").fill(inDays(120));
    await designerPage.getByLabel("Rooms").fill("Kitchen, Laundry");
    await designerPage.getByRole("button", { name: "Create project" }).click();
    await designerPage.waitForURL(/\/studio\/projects\/[0-9a-f-]{36}$/);
    projectId = new URL(designerPage.url()).pathname.split("/").pop() ?? "";

    await invite(designerPage, "A client (homeowner)", clientPerson);
    await invite(designerPage, "Contact at Bluegum Stone Co (Stonemason)", stonePerson);
    await snap(designerPage, "new-studio-project-people");
  });

  it("the designer opens a decision; the client approves it on a phone from the e-mail", async () => {
    const kitchen = await roomId("Kitchen");
    const created = await api(designerPage, "POST", `/api/projects/${projectId}/decisions`, {
      room: kitchen,
      title: "Kitchen benchtop",
      allowanceCents: 900000,
      dueDate: inDays(20),
      notify: true,
      options: [
        { label: "Driftwood quartzite", lines: [{ finishId: benchtopFinishId, quantity: 6.5, unit: "m²", item: "Benchtop", location: "Island and back run" }] },
        { label: "Ash porcelain", priceCents: 450000, priceOverridden: true, lines: [{ finishId: porcelainFinishId, quantity: 6.5, unit: "m²" }] },
      ],
    });
    expect(created.status).toBe(201);
    decisionId = String(created.body.id);

    const link = await mailLink(clientPerson.email, (l) => l.includes(`/client/decisions/${decisionId}`));
    clientPage = await open("phone");
    await clientPage.goto(link);
    await clientPage.waitForURL(/\/sign-in/);
    await signInByLink(clientPage, clientPerson.email);
    await clientPage.waitForURL(new RegExp(`/client/decisions/${decisionId}$`));
    const card = (name: string) => clientPage.locator("article", { has: clientPage.getByRole("heading", { name, exact: true }) });
    await card("Driftwood quartzite").getByRole("button", { name: "Pick this one" }).click();
    await card("Driftwood quartzite").getByText("Current pick").waitFor();
    await card("Driftwood quartzite").getByRole("link", { name: "Approve this option…" }).click();
    await clientPage.getByRole("button", { name: "Yes, approve and lock" }).click();
    await clientPage.waitForURL(/\?approved=1$/);
    await clientPage.getByTestId("locked-banner").waitFor();
    await snap(clientPage, "new-studio-client-approved-phone");
    const me = await api(clientPage, "GET", "/api/me");
    clientUserId = String(me.body.id ?? "");
    expect(clientUserId).not.toBe("");
  }, 120_000);

  it("the designer issues revision A; the stonemason acknowledges it and records dates on a phone", async () => {
    await designerPage.goto(`/studio/projects/${projectId}/specification`);
    await designerPage.getByRole("button", { name: /^Issue revision [A-Z]+…$/ }).click();
    const confirm = designerPage.getByRole("button", { name: /^Issue revision [A-Z]+$/ });
    revisionLetter = ((await confirm.textContent()) ?? "").replace("Issue revision ", "").trim();
    await confirm.click();
    await designerPage.waitForURL(/\/specification\/revisions\/[^/]+$/);

    const link = await mailLink(stonePerson.email, (l) => l.includes("/supplier/revisions/"));
    const phone = await open("phone");
    await phone.goto(link);
    await phone.waitForURL(/\/sign-in/);
    await signInByLink(phone, stonePerson.email);
    await phone.waitForURL(/\/supplier\/revisions\/[^/]+$/);
    const body = (await phone.locator("main").textContent()) ?? "";
    expect(body).toContain("Driftwood Quartzite");
    expect(body).toContain("Benchtop");
    expect(body).toContain("Honed, 20 mm slab");
    expect(body).toContain("14 Kestrel Lane, Fernbrook");
    expect(body).not.toMatch(/\$\s?\d/);
    await phone.getByRole("button", { name: `I've received revision ${revisionLetter}` }).click();
    await phone.getByText(`You acknowledged revision ${revisionLetter}`).waitFor();
    await phone.getByLabel("Ordered on").first().fill(new Date().toISOString().slice(0, 10));
    await phone.getByRole("button", { name: "Save dates" }).first().click();
    await phone.getByText("Saved.").first().waitFor();
    await snap(phone, "new-studio-supplier-phone");

    await designerPage.goto(`/studio/projects/${projectId}/handoff`);
    await designerPage.getByRole("region", { name: "Bluegum Stone Co" }).getByText(`Acknowledged revision ${revisionLetter}`, { exact: true }).waitFor();
    await snap(designerPage, "new-studio-handoff");
  }, 120_000);

  it("the studio corrects the install date (order-by moves), renames a room and removes the client", async () => {
    const orderByOf = async () => {
      const list = await api(designerPage, "GET", `/api/projects/${projectId}/decisions`);
      const items = (list.body.items ?? []) as { id: string; orderBy: Record<string, unknown> | null }[];
      return JSON.stringify(items.find((d) => d.id === decisionId)?.orderBy ?? null);
    };
    const before = await orderByOf();
    const moved = await api(designerPage, "PATCH", `/api/projects/${projectId}`, { installDate: inDays(150) });
    expect(moved.status).toBe(200);
    const after = await orderByOf();
    expect(before).not.toBe("null");
    expect(after).not.toBe(before);

    const kitchen = await roomId("Kitchen");
    const renamed = await api(designerPage, "PATCH", `/api/projects/${projectId}/rooms/${kitchen}`, { name: "Kitchen and scullery" });
    expect(renamed.status).toBe(200);
    const listed = await api(designerPage, "GET", `/api/projects/${projectId}/decisions`);
    expect((listed.body.items as { id: string; roomName: string }[]).find((d) => d.id === decisionId)?.roomName).toBe("Kitchen and scullery");

    const stillIn = await api(clientPage, "GET", `/api/decisions/${decisionId}`);
    expect(stillIn.status).toBe(200);
    const removed = await api(designerPage, "DELETE", `/api/projects/${projectId}/members/${clientUserId}`);
    expect(removed.status).toBeLessThan(300);
    const refused = await api(clientPage, "GET", `/api/decisions/${decisionId}`);
    expect([401, 403, 404]).toContain(refused.status);
    await designerPage.goto(`/studio/projects/${projectId}`);
    await snap(designerPage, "new-studio-project-corrected");
  }, 60_000);
});

function inDays(days: number) {
  const d = new Date();
  d.setUTCDate(d.getUTCDate() + days);
  return d.toISOString().slice(0, 10);
}

async function invite(page: Page, who: string, person: { name: string; email: string }) {
  await page.getByLabel("They are").selectOption({ label: who });
  await page.locator("#invite-name").fill(person.name);
  await page.locator("#invite-email").fill(person.email);
  await page.getByRole("button", { name: "Send invitation" }).click();
  await page.getByText("Invitation sent.").first().waitFor();
}

/** A room's id, read off the new-decision screen's room list (the way a designer picks it). */
async function roomId(name: string): Promise<string> {
  const page = await designerPage.context().newPage();
  await page.goto(`/studio/projects/${projectId}/decisions/new`);
  const id = await page.locator("#decision-room option", { hasText: name }).first().getAttribute("value");
  await page.close();
  return id ?? "";
}

async function setOwnPassword(page: Page, password: string) {
  await page.getByText("You don't have a password yet").waitFor();
  await page.getByLabel("New password", { exact: true }).fill(password);
  await page.getByLabel("New password again").fill(password);
  await page.getByRole("button", { name: "Set password" }).click();
  await page.getByText("Password set.").waitFor();
}
