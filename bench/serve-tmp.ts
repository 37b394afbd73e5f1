import { existsSync, writeFileSync } from "node:fs";
import { migrateDatabase } from "../db/migrate";
import { seedBenchStudio } from "../db/seed/bench-studio";
import { sessionCookie, startBenchServer } from "./server";
const databaseUrl = "file:/tmp/bx/bench.db";
if (!existsSync("/tmp/bx/bench.db")) {
  const { client, db } = await migrateDatabase(databaseUrl);
  await seedBenchStudio(db);
  client.close();
}
const { base, child } = await startBenchServer(".next-bench", databaseUrl, "/tmp/bx/uploads");
writeFileSync("/tmp/bx/env", `BASE=${base}\nDES='${await sessionCookie("bench-user-designer", "designer@bench.example")}'\nCLI='${await sessionCookie("bench-user-client", "client@bench.example")}'\nPID=${child.pid}\n`);
console.log("ready", base);
