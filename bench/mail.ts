import { spawn, type ChildProcess } from "node:child_process";
import { readdirSync } from "node:fs";
import { freePort } from "../scripts/lib/processes";

/**
 * The project's mail catcher in a process of its own (as `npm run demo` has it beside the app), so
 * the load generator in this process never starves it. Resolves once it is listening.
 */
export async function startCatcherProcess(dir: string): Promise<{ smtpUrl: string; child: ChildProcess }> {
  const port = await freePort();
  const child = spawn(process.execPath, ["node_modules/tsx/dist/cli.mjs", "scripts/mail-catcher.ts"], {
    stdio: ["ignore", "pipe", "inherit"],
    env: { ...process.env, MAIL_CATCHER_PORT: String(port), MAIL_CATCHER_DIR: dir },
  });
  await new Promise<void>((resolve, reject) => {
    child.stdout?.on("data", (chunk: Buffer) => {
      if (chunk.toString().includes("listening")) resolve();
    });
    child.once("exit", (code) => reject(new Error(`the mail catcher stopped (${code})`)));
  });
  return { smtpUrl: `smtp://127.0.0.1:${port}`, child };
}

const caught = (dir: string) => {
  try {
    return readdirSync(dir).filter((name) => name.endsWith(".json")).length;
  } catch {
    return 0;
  }
};

/** Waits until `count` messages have been caught; the seconds it took, or null after `timeoutMs`. */
export async function waitForCaught(dir: string, count: number, timeoutMs = 120_000): Promise<number | null> {
  const start = performance.now();
  while (caught(dir) < count) {
    if (performance.now() - start > timeoutMs) return null;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  return (performance.now() - start) / 1000;
}
