import { mkdirSync } from "node:fs";
import path from "node:path";
import { chromium, type Browser, type Page } from "playwright-core";

export const baseUrl = process.env.E2E_BASE_URL ?? "http://127.0.0.1:3000";
const artifacts = path.resolve("tests/artifacts");

export async function launch(): Promise<Browser> {
  return chromium.launch({
    executablePath: "/usr/bin/chromium",
    args: [
      "--headless",
      "--no-sandbox",
      "--disable-gpu",
      "--disable-quic",
      "--no-first-run",
      "--disable-background-networking",
      "--disable-component-update",
      "--disable-sync",
    ],
  });
}

export async function newPage(browser: Browser, device: "desktop" | "phone" = "desktop"): Promise<Page> {
  const context = await browser.newContext({
    viewport: device === "phone" ? { width: 390, height: 844 } : { width: 1280, height: 900 },
    baseURL: baseUrl,
  });
  return context.newPage();
}

/** Screenshots are kept as artefacts (gitignored) so a person can look at every screen a test walked. */
export async function snap(page: Page, name: string) {
  mkdirSync(artifacts, { recursive: true });
  await page.screenshot({ path: path.join(artifacts, `${name}.png`), fullPage: true });
}

export async function signInWithPassword(page: Page, email: string, password = "mottle-demo") {
  if (!new URL(page.url()).pathname.startsWith("/sign-in")) await page.goto("/sign-in");
  await page.fill("#password-email", email);
  await page.fill("#password", password);
  await page.getByRole("button", { name: "Sign in", exact: true }).click();
}

type Caught = { to: string[]; subject: string; links: string[]; receivedAt: string };

/** Asks for a sign-in link, reads it from the mail catcher through /api/dev/mail, and opens it. */
export async function signInWithLink(page: Page, email: string) {
  const since = Date.now() - 1000;
  await page.fill("#link-email", email);
  await page.getByRole("button", { name: "Send the link" }).click();
  await page.waitForURL(/\/sign-in\/check-email/);
  const link = await waitForLink(email, since);
  await page.goto(link);
}

async function waitForLink(email: string, since: number): Promise<string> {
  return waitForMailLink(email, since, (l) => l.includes("/api/auth/callback/nodemailer"));
}

/** The first link matching `wanted` in mail to `email` caught since `since` (ms), waiting up to 20 s. */
export async function waitForMailLink(email: string, since: number, wanted: (link: string) => boolean): Promise<string> {
  for (let i = 0; i < 80; i++) {
    const res = await fetch(`${baseUrl}/api/dev/mail?to=${encodeURIComponent(email)}`);
    const messages = (await res.json()) as Caught[];
    const link = messages
      .filter((m) => Date.parse(m.receivedAt) >= since)
      .flatMap((m) => m.links)
      .find(wanted);
    if (link) return link;
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`no matching link reached ${email}`);
}
