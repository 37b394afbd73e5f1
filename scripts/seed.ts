import { migrateDatabase } from "../db/migrate";
import { seedDemo } from "../db/seed/demo";
import { env } from "../lib/env";

// Migrates first, so `npm run db:seed` works on a fresh clone too. Idempotent: fixed ids.
const { client, db } = await migrateDatabase(env.DATABASE_URL, env.DATABASE_AUTH_TOKEN);
await seedDemo(db);
client.close();
console.log("Demo studio seeded: sign in as owner@demo.example / mottle-demo.");
