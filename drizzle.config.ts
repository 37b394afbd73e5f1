import { defineConfig } from "drizzle-kit";

// Migrations are generated from db/schema and committed; they are applied by `npm run db:migrate`.
export default defineConfig({
  dialect: "sqlite",
  schema: "./db/schema/index.ts",
  out: "./drizzle",
});
