import type { Browser, Locator, Page } from "playwright-core";
import { expect } from "vitest";
import { baseUrl } from "./browser";

/**
 * How long an answer may take on this shared 2-core machine before we call it a hang. Our own
 * margin (common practice, not a standard): a production page answers in well under a second.
 */
export const PROMPT_MS = 10_000;

/** A desktop page in a context of its own with JavaScript off, as a browser with scripts disabled. */
export async function newNoScriptPage(browser: Browser): Promise<Page> {
  const context = await browser.newContext({ javaScriptEnabled: false, baseURL: baseUrl, viewport: { width: 1280, height: 900 } });
  return context.newPage();
}

/**
 * Submits a form through its own submit button, so the browser posts exactly what the page
 * rendered: multipart/form-data with React's hidden `$ACTION_…` fields (HTML standard, "form
 * submission algorithm"; React docs, useActionState: forms work before JavaScript loads).
 * Waits for the next document to load and answers how long that took.
 */
export async function submitWithoutScript(page: Page, button: Locator): Promise<number> {
  const form = button.locator("xpath=ancestor::form[1]");
  // The real post carries React's fields; a form without them would not reach the action at all.
  expect(await form.locator('input[type="hidden"][name^="$ACTION_"]').count()).toBeGreaterThan(0);
  const started = Date.now();
  const loaded = page.waitForEvent("load", { timeout: PROMPT_MS }).then(
    () => null,
    (error: unknown) => error,
  );
  await button.click({ timeout: PROMPT_MS });
  const failed = await loaded;
  if (failed) throw new Error(`no answer within ${PROMPT_MS} ms after "${await button.textContent()}" on ${page.url()}`);
  const took = Date.now() - started;
  expect(took).toBeLessThan(PROMPT_MS);
  return took;
}

/** The server still answers other requests (a renderer stuck in a loop would starve them). */
export async function expectServerAnswers() {
  const res = await fetch(`${baseUrl}/api/health`, { signal: AbortSignal.timeout(5_000) });
  expect(res.status).toBe(200);
}

/** Whether the element has the focus (the `autofocus` attribute did its work, or a script moved it). */
export function isFocused(locator: Locator): Promise<boolean> {
  return locator.evaluate((el) => el === el.ownerDocument.activeElement);
}
