import { spawn, type ChildProcess } from "node:child_process";
import { mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { createClient } from "@libsql/client";
import { afterAll, describe, expect, it } from "vitest";
import { checkIntegrity } from "@/db/backup";
import { migrateDatabase } from "@/db/migrate";
import { seedDemo } from "@/db/seed/demo";
import { cookieFor } from "@/tests/support/personas";
import { freePort, serveCommand, waitForHttp } from "@/scripts/lib/processes";

/**
 * Kills the production server with SIGKILL in the middle of a stream of writes (revision issues,
 * fixed items, client choices, approvals), restarts it on the same database and checks nothing is
 * half done. Its own server and database, so the other browser tests are not disturbed.
 */
const secret = process.env.AUTH_SECRET ?? "";
const dir = mkdtempSync(path.join(tmpdir(), "mottle-durability-"));
const databaseUrl = `file:${path.join(dir, "durable.db")}`;
let server: ChildProcess | undefined;

async function startServer(port: number) {
  const [command, args] = serveCommand(port);
  const child = spawn(command, args, {
    stdio: ["ignore", "ignore", "inherit"],
    // Its own public origin: the e2e run's APP_URL belongs to the other server.
    env: { ...process.env, NODE_ENV: "production", APP_URL: `http://127.0.0.1:${port}`, PORT: String(port), DATABASE_URL: databaseUrl, UPLOADS_DIR: path.join(dir, "uploads"), SMTP_URL: "smtp://127.0.0.1:9" },
  });
  await waitForHttp(`http://127.0.0.1:${port}/api/health`, 60_000, child);
  return child;
}

afterAll(() => {
  server?.kill("SIGKILL");
});

describe("durability", () => {
  it("stays consistent when the server is killed in the middle of writes", { timeout: 180_000 }, async () => {
    const { client, db } = await migrateDatabase(databaseUrl);
    await seedDemo(db);
    client.close();
    const port = await freePort();
    const base = `http://127.0.0.1:${port}`;
    server = await startServer(port);
    const designer = await cookieFor("designer", secret);
    const clientCookie = await cookieFor("client", secret);
    const post = (url: string, cookie: string | undefined, body: unknown) =>
      fetch(base + url, { method: "POST", headers: { cookie: cookie ?? "", "content-type": "application/json", origin: base }, body: JSON.stringify(body) })
        .then((r) => r.status)
        .catch(() => 0);

    let running = true;
    let sent = 0;
    const loops = [
      async () => {
        for (let i = 0; running; i++) {
          await post("/api/projects/demo-project-marrow/fixed-items", designer, {
            roomId: "demo-room-kitchen", finishId: "demo-finish-paint-limewash", item: `Wall paint ${i}`, quantity: 10 + i, unit: "L",
          });
          await post("/api/projects/demo-project-marrow/revisions", designer, {});
          sent += 2;
        }
      },
      async () => {
        const options = ["demo-option-kp-opal", "demo-option-kp-brass"];
        for (let i = 0; running; i++) {
          await post("/api/decisions/demo-decision-kitchen-pendant/choice", clientCookie, { optionId: options[i % 2] });
          sent++;
        }
      },
      async () => {
        await new Promise((r) => setTimeout(r, 300));
        await post("/api/decisions/demo-decision-kitchen-splashback/approve", clientCookie, { optionId: "demo-option-ks-zellige", confirm: true });
        sent++;
      },
    ];
    const streams = loops.map((loop) => loop());
    // Kill once the writes are well under way (a busy machine is slower: wait for the count, not a clock).
    const deadline = Date.now() + 60_000;
    while (sent < 12 && Date.now() < deadline) await new Promise((r) => setTimeout(r, 50));
    server.kill("SIGKILL");
    running = false;
    await Promise.all(streams);
    expect(sent).toBeGreaterThan(10);

    server = await startServer(port);
    expect(await checkIntegrity(databaseUrl)).toBe("ok");
    const check = createClient({ url: databaseUrl });
    const revisions = await check.execute("select id, sequence, letter, content from spec_revision where project_id = 'demo-project-marrow' order by sequence");
    expect(revisions.rows.length).toBeGreaterThan(1);
    revisions.rows.forEach((row, i) => expect(Number(row.sequence)).toBe(i + 1));
    for (const row of revisions.rows) {
      const lines = await check.execute({ sql: "select count(*) as n from spec_line where revision_id = ?", args: [String(row.id)] });
      const content = JSON.parse(String(row.content)) as { lines: unknown[] };
      expect(Number(lines.rows[0]?.n), `revision ${String(row.letter)} is whole`).toBe(content.lines.length);
    }
    const halfLocked = await check.execute(
      "select count(*) as n from decision d where d.status = 'locked' and not exists (select 1 from approval a where a.decision_id = d.id)",
    );
    expect(Number(halfLocked.rows[0]?.n)).toBe(0);
    check.close();
    const res = await fetch(`${base}/api/projects`, { headers: { cookie: designer ?? "" } });
    expect(res.status).toBe(200);
  });
});
