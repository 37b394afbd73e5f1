import type { ChildProcess } from "node:child_process";
import { existsSync, mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { migrateDatabase } from "../db/migrate";
import { seedBenchStudio } from "../db/seed/bench-studio";
import { run } from "../scripts/lib/processes";
import { measureLoad, measurePageJs, rowsForEndpoint } from "./api";
import { runBoardsBench } from "./boards";
import { runColourBench } from "./colour";
import { startCatcherProcess, waitForCaught } from "./mail";
import { runUploadsBench } from "./uploads";
import { residentMemoryMiB, sessionCookie, startBenchServer } from "./server";
import { printTable, type BenchRow } from "./table";

/**
 * `npm run bench`: every benchmark against the production build, one table: our figure, a
 * baseline measured in the same run, the ratio and the target. Never part of `npm test`.
 */
function stopChild(child: ChildProcess): Promise<void> {
  if (child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
  return new Promise((resolve) => {
    child.once("exit", () => resolve());
    child.kill("SIGTERM");
  });
}

const args = new Set(process.argv.slice(2));
/** `--api-only` skips the in-process benchmarks; `--reuse-build` keeps an existing `.next-bench`. */
const apiOnly = args.has("--api-only");
const reuseBuild = args.has("--reuse-build") && existsSync(".next-bench/BUILD_ID");

const rows: BenchRow[] = [];
if (!apiOnly) {
  rows.push(...(await runColourBench()));
  rows.push(...(await runBoardsBench()));
  rows.push(...(await runUploadsBench()));
}

const dir = mkdtempSync(path.join(tmpdir(), "mottle-bench-"));
const databaseUrl = `file:${path.join(dir, "bench.db")}`;
const { client, db } = await migrateDatabase(databaseUrl);
await seedBenchStudio(db);
client.close();

const distDir = ".next-bench";
if (!reuseBuild) {
  console.log("Building the production app for the benchmark…");
  await run("npx", ["next", "build"], { ...process.env, NEXT_DIST_DIR: distDir, NEXT_TELEMETRY_DISABLED: "1" });
}
// The project's own mail catcher: a client's choice e-mails the studio, as it would in use.
const mailDir = path.join(dir, "mail");
const catcher = await startCatcherProcess(mailDir);
const { base, child } = await startBenchServer(distDir, databaseUrl, path.join(dir, "uploads"), catcher.smtpUrl);
try {
  const designer = await sessionCookie("bench-user-designer", "designer@bench.example");
  const clientCookie = await sessionCookie("bench-user-client", "client@bench.example");
  const warm = (url: string, cookie: string) => measureLoad(url, 10, { cookie, seconds: 2 });
  // A fresh server keeps getting faster for its first half minute or so, as V8 optimises the
  // framework's hot paths: load every read before measuring anything, so the baseline and the
  // endpoints are measured on an equally warm server.
  for (let round = 0; round < 2; round++) {
    for (const url of [`${base}/api/health`, `${base}/api/boards/bench-board-0`, `${base}/api/finishes?category=stone&page=1`]) {
      await measureLoad(url, 50, { cookie: designer, seconds: 5 });
    }
  }

  const baseline50 = await measureLoad(`${base}/api/health`, 50);
  const baseline10 = await measureLoad(`${base}/api/health`, 10);
  rows.push({ measure: "baseline /api/health: req/s at 50, p99 at 10", ours: `${baseline50.rps.toFixed(0)} req/s`, baseline: "–", ratio: "–", target: "–", met: "–" });
  rows.push({ measure: "baseline /api/health: p99 at 10 connections", ours: `${baseline10.p99} ms`, baseline: "–", ratio: "–", target: "–", met: "–" });

  const endpoints: [string, string, string, { method?: "POST"; bodies?: string[] }][] = [
    ["GET board with checks", `${base}/api/boards/bench-board-0`, designer, {}],
    ["GET finish table page 1, filtered", `${base}/api/finishes?category=stone&page=1`, designer, {}],
    // Back and forth between two options, each pick with a comment, so every request is a real
    // write and an e-mail (picking the same option again with nothing to say writes nothing).
    ["POST client choice", `${base}/api/decisions/bench-decision-0-0/choice`, clientCookie, {
      method: "POST",
      bodies: ["bench-option-0-0-1", "bench-option-0-0-2"].map((optionId) => JSON.stringify({ optionId, comment: "Still weighing these two." })),
    }],
  ];
  let picks = 0;
  // Each pick e-mails the studio's one designer after answering; before the next run, the mail
  // from the last one is let out, so one run's backlog does not slow the next.
  const drain = async (load: { ok: number }) => {
    picks += load.ok;
    return waitForCaught(mailDir, picks);
  };
  for (const [name, url, cookie, extra] of endpoints) {
    const writes = extra.method === "POST";
    await warm(url, cookie).then((load) => (writes ? drain(load) : null));
    const at50 = await measureLoad(url, 50, { cookie, ...extra });
    const drained = writes ? await drain(at50) : null;
    const at10 = await measureLoad(url, 10, { cookie, ...extra });
    rows.push(...rowsForEndpoint(name, at50, at10, baseline50, !writes));
    if (writes) {
      rows.push({
        measure: `${name}: every e-mail of the 50-connection run delivered (${at50.ok})`, ours: drained === null ? "not within 2 min" : `${drained.toFixed(1)} s after`,
        baseline: "–", ratio: "–", target: "reported", met: "–",
      });
      await drain(at10);
    }
  }

  const bare = await measurePageJs(base, "/sign-in/check-email");
  const decisionPage = await measurePageJs(base, "/client/decisions/bench-decision-0-0", clientCookie);
  const extra = (decisionPage - bare) / 1024;
  rows.push({
    measure: "client decision page: first-load JS more than a bare page (gzip)",
    ours: `${(decisionPage / 1024).toFixed(1)} kB`, baseline: `${(bare / 1024).toFixed(1)} kB`, ratio: `+${extra.toFixed(1)} kB`,
    target: "≤ +60 kB", met: extra <= 60 ? "yes" : "no",
  });
  rows.push({ measure: "server resident memory after the load run", ours: `${residentMemoryMiB(child.pid ?? 0).toFixed(0)} MiB`, baseline: "–", ratio: "–", target: "reported", met: "–" });
} finally {
  // The server first, so nothing is still being sent; then the catcher, then their files.
  await stopChild(child);
  await stopChild(catcher.child);
  rmSync(dir, { recursive: true, force: true, maxRetries: 5 });
}
printTable(rows);
