import path from "node:path";
import { migrate } from "drizzle-orm/libsql/migrator";
import { createDatabase, prepareDatabase } from "./client";

/** Applies the committed migrations in drizzle/ to the database at `url`. */
export async function migrateDatabase(url: string, authToken?: string) {
  const { client, db } = createDatabase(url, authToken);
  await prepareDatabase(client, url);
  await migrate(db, { migrationsFolder: path.resolve(process.cwd(), "drizzle") });
  return { client, db };
}
