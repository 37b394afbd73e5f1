import { spawn } from "node:child_process";
import { startMailCatcher } from "../lib/mail/catcher";
import { freePort, run, stopOnSignals } from "./lib/processes";

/** `npm run dev`: migrate, start the mail catcher, then `next dev` with hot reload. */
process.env.MOTTLE_MODE ??= "development";
const catcherPort = Number(process.env.MAIL_CATCHER_PORT ?? (await freePort()));
process.env.SMTP_URL ??= `smtp://127.0.0.1:${catcherPort}`;
const { env } = await import("../lib/env");
await run("npx", ["tsx", "--conditions=react-server", "scripts/seed.ts"]);
const catcher = await startMailCatcher({ port: catcherPort, dir: env.MAIL_CATCHER_DIR });
const next = spawn("npx", ["next", "dev", "-p", process.env.PORT ?? "3000"], { stdio: "inherit", env: process.env });
stopOnSignals(async () => {
  next.kill("SIGTERM");
  await catcher.close();
});
