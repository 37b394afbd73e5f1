import { mkdirSync, mkdtempSync, readdirSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { createClient } from "@libsql/client";
import { describe, expect, it } from "vitest";
import { backupDatabase, checkIntegrity, restoreBackup, tableCounts } from "@/db/backup";

describe("npm run backup", () => {
  it("copies a consistent database and every upload while writes go on, and restores them", async () => {
    const url = process.env.DATABASE_URL ?? "";
    const uploads = process.env.UPLOADS_DIR ?? "";
    mkdirSync(uploads, { recursive: true });
    for (let i = 0; i < 5; i++) writeFileSync(path.join(uploads, `photo-${i}.webp`), `image ${i}`);

    // A stream of writes from another connection while the backup runs.
    const writer = createClient({ url });
    let writing = true;
    const writes = (async () => {
      let i = 0;
      while (writing) {
        await writer.execute({
          sql: "insert into audit_log (id, studio_id, action, entity_type, entity_id) values (?, 'demo-studio-fernleaf', 'test.write', 'test', ?)",
          args: [`backup-test-${i}`, String(i)],
        });
        i++;
        // The embedded client runs statements synchronously: yield so the backup gets its turn.
        await new Promise((resolve) => setImmediate(resolve));
      }
      return i;
    })();
    const dir = mkdtempSync(path.join(tmpdir(), "mottle-backup-"));
    const manifest = await backupDatabase(url, uploads, dir);
    writing = false;
    const written = await writes;
    writer.close();
    expect(written).toBeGreaterThan(0);

    const restoredDb = path.join(dir, "restored", "mottle.db");
    const restoredUploads = path.join(dir, "restored", "uploads");
    await restoreBackup(dir, restoredDb, restoredUploads);
    expect(await checkIntegrity(`file:${restoredDb}`)).toBe("ok");
    const restored = await tableCounts(`file:${restoredDb}`);
    expect(restored).toEqual(manifest.tables);
    expect(restored.finish).toBeGreaterThan(50);
    expect(readdirSync(restoredUploads).sort()).toEqual(readdirSync(uploads).sort());
  });

  it("refuses a libSQL server URL with a clear message", async () => {
    await expect(backupDatabase("libsql://example.invalid", "/tmp", "/tmp/x")).rejects.toThrow(/server's own backups/);
  });
});
