import { cp, mkdir, readdir, stat } from "node:fs/promises";
import path from "node:path";
import { createClient } from "@libsql/client";

export type BackupManifest = {
  createdAt: string;
  database: string;
  uploads: string;
  tables: Record<string, number>;
  files: number;
};

async function tableCounts(url: string): Promise<Record<string, number>> {
  const client = createClient({ url });
  try {
    const { rows } = await client.execute(
      "select name from sqlite_master where type = 'table' and name not like 'sqlite_%' and name not like '__drizzle%' order by name",
    );
    const counts: Record<string, number> = {};
    for (const row of rows) {
      const name = String(row.name);
      const result = await client.execute(`select count(*) as n from "${name.replaceAll('"', '""')}"`);
      counts[name] = Number(result.rows[0]?.n ?? 0);
    }
    return counts;
  } finally {
    client.close();
  }
}

async function countFiles(dir: string): Promise<number> {
  try {
    const entries = await readdir(dir, { recursive: true });
    let files = 0;
    for (const entry of entries) if ((await stat(path.join(dir, entry))).isFile()) files++;
    return files;
  } catch {
    return 0;
  }
}

/**
 * A consistent copy while the app runs: `VACUUM INTO` writes a snapshot of one moment (readers
 * and the WAL writer carry on), then the uploads are copied. Uploads are written before the rows
 * that point at them, so every file the snapshot names is already on disk.
 */
export async function backupDatabase(databaseUrl: string, uploadsDir: string, targetDir: string): Promise<BackupManifest> {
  if (!databaseUrl.startsWith("file:")) {
    throw new Error("npm run backup copies an embedded SQLite file; for a libSQL server use the server's own backups.");
  }
  await mkdir(targetDir, { recursive: true });
  const database = path.join(targetDir, "mottle.db");
  const client = createClient({ url: databaseUrl });
  try {
    await client.execute({ sql: "VACUUM INTO ?", args: [database] });
  } finally {
    client.close();
  }
  const uploads = path.join(targetDir, "uploads");
  await mkdir(uploads, { recursive: true });
  await cp(uploadsDir, uploads, { recursive: true, force: true, errorOnExist: false }).catch((error: NodeJS.ErrnoException) => {
    if (error.code !== "ENOENT") throw error;
  });
  return {
    createdAt: new Date().toISOString(),
    database,
    uploads,
    tables: await tableCounts(`file:${database}`),
    files: await countFiles(uploads),
  };
}

/** Puts a backup in place of a (stopped) app's database file and uploads folder. */
export async function restoreBackup(backupDir: string, databasePath: string, uploadsDir: string) {
  await mkdir(path.dirname(databasePath), { recursive: true });
  await cp(path.join(backupDir, "mottle.db"), databasePath, { force: true });
  await cp(path.join(backupDir, "uploads"), uploadsDir, { recursive: true, force: true });
}

export async function checkIntegrity(databaseUrl: string): Promise<string> {
  const client = createClient({ url: databaseUrl });
  try {
    const { rows } = await client.execute("PRAGMA integrity_check");
    return String(rows[0]?.integrity_check ?? "unknown");
  } finally {
    client.close();
  }
}

export { tableCounts, countFiles };
