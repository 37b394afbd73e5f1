import { spawn, type ChildProcess } from "node:child_process";
import { readFileSync } from "node:fs";
import { encode } from "next-auth/jwt";
import { freePort, serveCommand, waitForHttp } from "../scripts/lib/processes";

export const BENCH_SECRET = "bench-secret-bench-secret-bench-secret-0123";

/** Mottle's production server (scripts/serve.ts) on the build in `distDir`, on a free port, with the benchmark database. */
export async function startBenchServer(distDir: string, databaseUrl: string, uploadsDir: string, smtpUrl: string) {
  const port = await freePort();
  const [command, args] = serveCommand(port);
  const child: ChildProcess = spawn(command, args, {
    stdio: ["ignore", "ignore", "inherit"],
    env: {
      ...process.env,
      NEXT_TELEMETRY_DISABLED: "1",
      NODE_ENV: "production",
      NEXT_DIST_DIR: distDir,
      MOTTLE_MODE: "test",
      DATABASE_URL: databaseUrl,
      UPLOADS_DIR: uploadsDir,
      AUTH_SECRET: BENCH_SECRET,
      AUTH_TRUST_HOST: "true",
      SMTP_URL: smtpUrl,
    },
  });
  const base = `http://127.0.0.1:${port}`;
  await waitForHttp(`${base}/api/health`, 60_000, child);
  return { base, child };
}

/** A session cookie for a benchmark user, signed as Auth.js would sign it. */
export async function sessionCookie(userId: string, email: string) {
  const name = "authjs.session-token";
  const value = await encode({ token: { sub: userId, email }, secret: BENCH_SECRET, salt: name, maxAge: 3600 });
  return `${name}=${value}`;
}

/** Resident memory of a process and its children, in MiB (Linux /proc). */
export function residentMemoryMiB(pid: number): number {
  const pids = [pid, ...childPids(pid)];
  let kib = 0;
  for (const p of pids) {
    try {
      const match = /VmRSS:\s+(\d+)/.exec(readFileSync(`/proc/${p}/status`, "utf8"));
      kib += Number(match?.[1] ?? 0);
    } catch {
      // gone
    }
  }
  return kib / 1024;
}

function childPids(pid: number): number[] {
  try {
    const children = readFileSync(`/proc/${pid}/task/${pid}/children`, "utf8").trim().split(/\s+/).filter(Boolean).map(Number);
    return children.flatMap((c) => [c, ...childPids(c)]);
  } catch {
    return [];
  }
}
