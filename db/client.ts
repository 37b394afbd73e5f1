import { mkdirSync } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { createClient, type Client } from "@libsql/client";
import { drizzle } from "drizzle-orm/libsql";
import * as schema from "./schema";

export type Database = ReturnType<typeof createDatabase>["db"];

/**
 * Opens a libSQL database: an embedded SQLite file (file: URL) or a libSQL server
 * (libsql:// or http(s)://, with an auth token). Kept apart from db/index.ts so scripts and
 * tests can open a database of their own.
 */
export function createDatabase(url: string, authToken?: string) {
  if (url.startsWith("file:")) mkdirSync(path.dirname(filePath(url)), { recursive: true });
  const client: Client = createClient({ url, authToken, concurrency: 8, timeout: 5000 });
  const db = drizzle(client, { schema });
  return { client, db };
}

/** Foreign keys on for every connection; WAL so readers never wait on the writer. */
export async function prepareDatabase(client: Client, url: string) {
  await client.execute("PRAGMA foreign_keys = ON");
  if (url.startsWith("file:")) {
    await client.execute("PRAGMA journal_mode = WAL");
    await client.execute("PRAGMA synchronous = NORMAL");
  }
}

function filePath(url: string) {
  return url.startsWith("file://") ? fileURLToPath(url) : url.slice("file:".length);
}
