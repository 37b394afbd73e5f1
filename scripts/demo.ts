import { startMailCatcher } from "../lib/mail/catcher";
import { freePort, run, startNext, stopOnSignals } from "./lib/processes";

/**
 * `npm run demo`: migrate and seed the embedded SQLite file, build, start the mail catcher and
 * serve the demo studio on PORT (default 3000). Caught mail: /dev/mail.
 */
process.env.MOTTLE_MODE = "demo";
const port = Number(process.env.PORT ?? 3000);
const catcherPort = Number(process.env.MAIL_CATCHER_PORT ?? (await freePort()));
process.env.SMTP_URL = `smtp://127.0.0.1:${catcherPort}`;

const { env } = await import("../lib/env");
await run("npx", ["tsx", "--conditions=react-server", "scripts/seed.ts"]);
const catcher = await startMailCatcher({ port: catcherPort, dir: env.MAIL_CATCHER_DIR });
await run("npx", ["next", "build"], { ...process.env, NEXT_TELEMETRY_DISABLED: "1" });
const server = await startNext(port, { ...process.env, AUTH_TRUST_HOST: "true" });

console.log(`
Mottle demo studio: http://127.0.0.1:${port}
  Studio (password mottle-demo): owner@demo.example, designer@demo.example, other@demo.example (another studio)
  Clients (e-mail link):         client@demo.example, client2@demo.example
  Suppliers (e-mail link):       stone@, joinery@, flooring@, tiles@, lighting@, appliances@demo.example
  Caught mail (sign-in links):   http://127.0.0.1:${port}/dev/mail
`);

stopOnSignals(async () => {
  server.kill("SIGTERM");
  await catcher.close();
});
server.on("exit", async (code) => {
  await catcher.close();
  process.exit(code ?? 0);
});
