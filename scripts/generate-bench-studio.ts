import { migrateDatabase } from "../db/migrate";
import { seedBenchStudio } from "../db/seed/bench-studio";
import { env } from "../lib/env";

/** Fills DATABASE_URL with the benchmark studio (see db/seed/bench-studio.ts). */
const started = Date.now();
const { client, db } = await migrateDatabase(env.DATABASE_URL, env.DATABASE_AUTH_TOKEN);
await seedBenchStudio(db);
client.close();
console.log(`Bench studio ready in ${((Date.now() - started) / 1000).toFixed(1)} s.`);
