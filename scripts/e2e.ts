import { existsSync, mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { ensureChromium } from "./ensure-chromium";
import { freePort, run, startNext } from "./lib/processes";

/**
 * Browser tests against the production build: a fresh seeded database and mail catcher in a
 * temporary folder, Mottle's server (scripts/serve.ts) on a free port, then vitest with tests/e2e.
 */
const dir = mkdtempSync(path.join(tmpdir(), "mottle-e2e-"));
const port = await freePort();
const catcherPort = await freePort();
const env: NodeJS.ProcessEnv = {
  ...process.env,
  NEXT_TELEMETRY_DISABLED: "1",
  MOTTLE_MODE: "test",
  DATABASE_URL: `file:${path.join(dir, "e2e.db")}`,
  MAIL_CATCHER_DIR: path.join(dir, "mail"),
  UPLOADS_DIR: path.join(dir, "uploads"),
  SMTP_URL: `smtp://127.0.0.1:${catcherPort}`,
  AUTH_TRUST_HOST: "true",
  // Known to the tests, so the permission matrix can sign its own session cookies.
  AUTH_SECRET: "e2e-secret-e2e-secret-e2e-secret-e2e-secret",
  // The public origin every e-mailed link and every write's Origin is measured against.
  APP_URL: `http://127.0.0.1:${port}`,
  E2E_BASE_URL: `http://127.0.0.1:${port}`,
  E2E_CATCHER_PORT: String(catcherPort),
};

// NEXT_DIST_DIR lets two checkouts' worth of builds sit side by side (see next.config.ts).
const distDir = process.env.NEXT_DIST_DIR ?? ".next";
// Test files named on the command line run on their own (`npm run test:e2e -- --no-build tests/e2e/x.test.ts`).
const only = process.argv.slice(2).filter((a) => a.endsWith(".test.ts"));

await ensureChromium();
if (!process.argv.includes("--no-build") || !existsSync(path.join(distDir, "BUILD_ID"))) await run("npx", ["next", "build"], env);
await run("npx", ["tsx", "--conditions=react-server", "scripts/seed.ts"], env);
const { startMailCatcher } = await import("../lib/mail/catcher");
const catcher = await startMailCatcher({ port: catcherPort, dir: env.MAIL_CATCHER_DIR ?? "" });
const server = await startNext(port, env, true, "127.0.0.1");
let failed = false;
// First, on the freshly seeded database, the files that read the seed as it is (the permission
// matrix only sends bodies that are refused; records reads the demo's history); then the flows
// that change it.
const readsSeed = ["tests/e2e/permission-matrix.test.ts", "tests/e2e/records.test.ts"];
const suites = only.length ? [only] : [readsSeed, readsSeed.flatMap((file) => ["--exclude", file])];
try {
  for (const suite of suites) {
    await run("npx", ["vitest", "run", "--config", "vitest.e2e.config.ts", ...suite], env).catch((error: unknown) => {
      failed = true;
      console.error(error instanceof Error ? error.message : error);
    });
  }
} finally {
  server.kill("SIGTERM");
  // A server whose main thread is stuck never runs its SIGTERM handler: make sure it goes.
  setTimeout(() => server.kill("SIGKILL"), 5000).unref();
  await catcher.close();
  rmSync(dir, { recursive: true, force: true });
}
process.exit(failed ? 1 : 0);
