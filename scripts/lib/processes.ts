import { spawn, type ChildProcess } from "node:child_process";
import { createServer } from "node:net";

/** Runs a command to completion with inherited output; rejects on a non-zero exit. */
export function run(command: string, args: string[], env: NodeJS.ProcessEnv = process.env): Promise<void> {
  return new Promise((resolve, reject) => {
    const child = spawn(command, args, { stdio: "inherit", env });
    child.on("error", reject);
    child.on("exit", (code, signal) =>
      code === 0 ? resolve() : reject(new Error(`${command} ${args.join(" ")} failed (${signal ?? `exit ${code}`})`)),
    );
  });
}

/** The command line of Mottle's own server (scripts/serve.ts); the child is node itself, so a signal reaches it. */
export function serveCommand(port: number, host = "127.0.0.1", dev = false): [string, string[]] {
  return [process.execPath, ["--import", "tsx", "scripts/serve.ts", "--port", String(port), "--hostname", host, ...(dev ? ["--dev"] : [])]];
}

/** Starts the production server (scripts/serve.ts) on a port and waits until it answers. */
export async function startNext(port: number, env: NodeJS.ProcessEnv, quiet = false, host?: string): Promise<ChildProcess> {
  const [command, args] = serveCommand(port, host);
  const child = spawn(command, args, {
    stdio: quiet ? ["ignore", "ignore", "inherit"] : "inherit",
    env: { ...env, NEXT_TELEMETRY_DISABLED: "1", NODE_ENV: "production", PORT: String(port) },
    detached: false,
  });
  await waitForHttp(`http://127.0.0.1:${port}/sign-in`, 60_000, child);
  return child;
}

export async function waitForHttp(url: string, timeoutMs: number, child?: ChildProcess) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (child && child.exitCode !== null) throw new Error(`the server exited (code ${child.exitCode}) before answering`);
    try {
      const res = await fetch(url, { redirect: "manual" });
      if (res.status < 500) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`${url} did not answer within ${timeoutMs / 1000} s`);
}

/** A free TCP port on loopback, for servers started by tests and benchmarks. */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.unref();
    server.on("error", reject);
    server.listen(0, "127.0.0.1", () => {
      const address = server.address();
      const port = typeof address === "object" && address ? address.port : 0;
      server.close(() => resolve(port));
    });
  });
}

export function stopOnSignals(cleanup: () => Promise<void> | void) {
  for (const signal of ["SIGINT", "SIGTERM"] as const) {
    process.on(signal, async () => {
      await cleanup();
      process.exit(0);
    });
  }
}
