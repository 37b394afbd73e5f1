import { existsSync } from "node:fs";
import { run } from "./lib/processes";

export const CHROMIUM = "/usr/bin/chromium";

/** Browser tests need Debian's Chromium: installed here when running as root, else a clear message. */
export async function ensureChromium() {
  if (existsSync(CHROMIUM)) return;
  if (process.getuid?.() !== 0) {
    throw new Error("Browser tests need Chromium at /usr/bin/chromium. Install it with: sudo apt-get install -y chromium");
  }
  console.log("Installing Debian's chromium for the browser tests (about a minute)…");
  const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
  try {
    await run("apt-get", ["install", "-y", "--no-install-recommends", "chromium"], env);
  } catch {
    await run("apt-get", ["update"], env);
    await run("apt-get", ["install", "-y", "--no-install-recommends", "chromium"], env);
  }
}
