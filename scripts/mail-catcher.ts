// Local SMTP catcher for development: point the app's SMTP URL at it and read the JSON files.
import { resolve } from "node:path";
import { startMailCatcher } from "../lib/mail/catcher";

const DEFAULT_PORT = 2525;

function readPort(raw: string | undefined): number {
  if (raw === undefined || raw.trim() === "") return DEFAULT_PORT;
  const port = Number(raw);
  if (!Number.isInteger(port) || port < 0 || port > 65_535) {
    throw new Error(`MAIL_CATCHER_PORT must be a port number, got ${JSON.stringify(raw)}`);
  }
  return port;
}

async function runMailCatcher(): Promise<void> {
  const dir = resolve(process.env.MAIL_CATCHER_DIR || ".data/mail");
  const host = "127.0.0.1";
  const catcher = await startMailCatcher({ port: readPort(process.env.MAIL_CATCHER_PORT), host, dir });
  console.log(`Mail catcher listening on smtp://${host}:${catcher.port}`);
  console.log(`Caught messages are written to ${dir}`);

  let stopping = false;
  const stop = (signal: NodeJS.Signals) => {
    if (stopping) return;
    stopping = true;
    console.log(`\n${signal} received, stopping the mail catcher…`);
    catcher.close().then(
      () => process.exit(0),
      (error: unknown) => {
        console.error(error);
        process.exit(1);
      },
    );
  };
  process.on("SIGINT", stop);
  process.on("SIGTERM", stop);
}

runMailCatcher().catch((error: unknown) => {
  console.error("Mail catcher failed to start:", error instanceof Error ? error.message : error);
  process.exit(1);
});
