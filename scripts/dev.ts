import { spawn } from "node:child_process";
import { startMailCatcher } from "../lib/mail/catcher";
import { freePort, run, serveCommand, stopOnSignals } from "./lib/processes";

/** `npm run dev`: migrate, start the mail catcher, then Mottle's server in development mode (hot reload), on 127.0.0.1. */
process.env.MOTTLE_MODE ??= "development";
const catcherPort = Number(process.env.MAIL_CATCHER_PORT ?? (await freePort()));
process.env.SMTP_URL ??= `smtp://127.0.0.1:${catcherPort}`;
const { env } = await import("../lib/env");
await run("npx", ["tsx", "--conditions=react-server", "scripts/seed.ts"]);
const catcher = await startMailCatcher({ port: catcherPort, dir: env.MAIL_CATCHER_DIR });
const [command, args] = serveCommand(Number(process.env.PORT ?? 3000), process.env.HOST ?? "127.0.0.1", true);
const next = spawn(command, args, { stdio: "inherit", env: process.env });
stopOnSignals(async () => {
  next.kill("SIGTERM");
  await catcher.close();
});
