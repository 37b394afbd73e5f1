import { mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, vi } from "vitest";
import { startMailCatcher } from "@/lib/mail/catcher";

/**
 * Each integration test file gets a fresh libSQL file with the migrations applied and the demo
 * studio seeded, its own mail catcher, and a stand-in for the Auth.js session so a test can act
 * as whichever person it needs (see tests/support/session.ts).
 */
const dir = mkdtempSync(path.join(tmpdir(), "mottle-it-"));
const catcher = await startMailCatcher({ port: 0, dir: path.join(dir, "mail") });
Object.assign(process.env, {
  MOTTLE_MODE: "test",
  DATABASE_URL: `file:${path.join(dir, "test.db")}`,
  MAIL_CATCHER_DIR: path.join(dir, "mail"),
  UPLOADS_DIR: path.join(dir, "uploads"),
  SMTP_URL: `smtp://127.0.0.1:${catcher.port}`,
  AUTH_SECRET: "integration-tests-secret-integration-tests-secret",
  // Every e-mailed link and every write's Origin is measured against this (lib/env.ts publicOrigin).
  APP_URL: "http://mottle.test",
});

const { migrateDatabase } = await import("@/db/migrate");
const { seedDemo } = await import("@/db/seed/demo");
const { client, db } = await migrateDatabase(process.env.DATABASE_URL ?? "");
await seedDemo(db);
client.close();

vi.mock("@/lib/auth", async () => (await import("@/tests/support/session")).authModuleStub);

afterAll(async () => {
  await catcher.close();
});
