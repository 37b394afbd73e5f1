import "server-only";
import { env } from "@/lib/env";
import { createDatabase, prepareDatabase } from "./client";

/** The app's one database handle. Only db/queries/* import it. */
const globalForDb = globalThis as unknown as { mottleDb?: ReturnType<typeof createDatabase>; mottleDbReady?: Promise<void> };

const handle = (globalForDb.mottleDb ??= createDatabase(env.DATABASE_URL, env.DATABASE_AUTH_TOKEN));
globalForDb.mottleDbReady ??= prepareDatabase(handle.client, env.DATABASE_URL);

export const db = handle.db;
export const dbClient = handle.client;
export const dbReady = globalForDb.mottleDbReady;
