import { writeFile } from "node:fs/promises";
import path from "node:path";
import { backupDatabase } from "../db/backup";
import { env } from "../lib/env";

/** `npm run backup [folder]`: a consistent copy of the database and uploads, safe while the app runs. */
const stamp = new Date().toISOString().replaceAll(/[:.]/g, "-");
const target = path.resolve(process.argv[2] ?? path.join("backups", stamp));
const manifest = await backupDatabase(env.DATABASE_URL, env.UPLOADS_DIR, target);
await writeFile(path.join(target, "manifest.json"), JSON.stringify(manifest, null, 2));
const rows = Object.values(manifest.tables).reduce((a, b) => a + b, 0);
console.log(`Backup written to ${target}: ${rows} rows in ${Object.keys(manifest.tables).length} tables, ${manifest.files} files.`);
