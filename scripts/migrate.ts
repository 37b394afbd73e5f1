import { migrateDatabase } from "../db/migrate";
import { env } from "../lib/env";

const { client } = await migrateDatabase(env.DATABASE_URL, env.DATABASE_AUTH_TOKEN);
client.close();
console.log(`Migrations applied to ${env.DATABASE_URL.startsWith("file:") ? env.DATABASE_URL : "the libSQL server"}.`);
