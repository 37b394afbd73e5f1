import { ensureChromium } from "./ensure-chromium";
import { run } from "./lib/processes";

type Step = [string, string[]];

/**
 * `npm test`: everything CI checks, stopping at the first failure. Steps in one group run side by
 * side (the type check and the linter share nothing); groups run in order. The build skips its own
 * type check because tsc has just checked the same tree (next.config.ts reads MOTTLE_TYPECHECKED).
 */
const groups: Step[][] = [
  [
    ["npx", ["tsc", "--noEmit"]],
    ["npx", ["eslint", "."]],
  ],
  [["npx", ["vitest", "run"]]],
  [["npx", ["next", "build"]]],
];

const env = { ...process.env, NEXT_TELEMETRY_DISABLED: "1", MOTTLE_TYPECHECKED: "1" };
try {
  await ensureChromium();
  for (const group of groups) {
    console.log(`\n▶ ${group.map(([command, args]) => `${command} ${args.join(" ")}`).join("  ‖  ")}`);
    await Promise.all(group.map(([command, args]) => run(command, args, env)));
  }
  console.log("\n▶ browser tests");
  await run("npx", ["tsx", "scripts/e2e.ts", "--no-build"], env);
  console.log("\nAll checks passed.");
} catch (error) {
  console.error(`\n✗ ${error instanceof Error ? error.message : String(error)}`);
  process.exit(1);
}
