import { ensureChromium } from "./ensure-chromium";
import { run } from "./lib/processes";

/** `npm test`: everything CI checks, in order, stopping at the first failure. */
const steps: [string, string[]][] = [
  ["npx", ["tsc", "--noEmit"]],
  ["npx", ["eslint", "."]],
  ["npx", ["vitest", "run"]],
  ["npx", ["next", "build"]],
];

const env = { ...process.env, NEXT_TELEMETRY_DISABLED: "1" };
try {
  await ensureChromium();
  for (const [command, args] of steps) {
    console.log(`\n▶ ${command} ${args.join(" ")}`);
    await run(command, args, env);
  }
  console.log("\n▶ browser tests");
  await run("npx", ["tsx", "scripts/e2e.ts", "--no-build"], env);
  console.log("\nAll checks passed.");
} catch (error) {
  console.error(`\n✗ ${error instanceof Error ? error.message : String(error)}`);
  process.exit(1);
}
