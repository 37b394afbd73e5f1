import { fileURLToPath } from "node:url";
import { defineConfig } from "vitest/config";

// Browser tests share one server and one seeded database, so they run one file at a time.
export default defineConfig({
  resolve: { alias: { "@": fileURLToPath(new URL("./", import.meta.url)) } },
  test: {
    include: ["tests/e2e/**/*.test.ts"],
    environment: "node",
    testTimeout: 60_000,
    hookTimeout: 60_000,
    fileParallelism: false,
  },
});
