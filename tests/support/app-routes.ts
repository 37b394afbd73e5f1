import { readdirSync, readFileSync, statSync } from "node:fs";
import path from "node:path";

export type DiscoveredRoute = { kind: "page" | "api"; pattern: string; method: string; file: string };
export type DiscoveredAction = { file: string; name: string };

const APP = path.resolve("app");
const METHODS = ["GET", "POST", "PUT", "PATCH", "DELETE"];

function walk(dir: string): string[] {
  return readdirSync(dir).flatMap((entry) => {
    const full = path.join(dir, entry);
    return statSync(full).isDirectory() ? walk(full) : [full];
  });
}

/** "/(public)/sign-in/page.tsx" → "/sign-in": route groups vanish from the URL. */
function toPattern(file: string): string {
  const segments = path.relative(APP, path.dirname(file)).split(path.sep).filter((s) => s && !/^\(.*\)$/.test(s));
  return `/${segments.join("/")}`;
}

/** Every page and route handler method under app/, found from the files themselves. */
export function discoverRoutes(): DiscoveredRoute[] {
  const routes: DiscoveredRoute[] = [];
  for (const file of walk(APP)) {
    const base = path.basename(file);
    if (base === "page.tsx") routes.push({ kind: "page", pattern: toPattern(file), method: "GET", file });
    if (base === "route.ts") {
      const source = readFileSync(file, "utf8");
      for (const method of METHODS) {
        const exported = new RegExp(`export\\s+(const|async function|function)\\s+${method}\\b|export\\s+const\\s+\\{[^}]*\\b${method}\\b`).test(source);
        if (exported) routes.push({ kind: "api", pattern: toPattern(file), method, file });
      }
    }
  }
  return routes.sort((a, b) => `${a.pattern} ${a.method}`.localeCompare(`${b.pattern} ${b.method}`));
}

/** Every exported function of every "use server" file under app/ and lib/. */
export function discoverActions(): DiscoveredAction[] {
  const files = [...walk(APP), ...walk(path.resolve("lib"))].filter((f) => /\.tsx?$/.test(f));
  const actions: DiscoveredAction[] = [];
  for (const file of files) {
    const source = readFileSync(file, "utf8");
    if (!/^\s*["']use server["']/.test(source)) continue;
    for (const match of source.matchAll(/export\s+async\s+function\s+(\w+)/g)) {
      actions.push({ file: path.relative(process.cwd(), file), name: match[1] ?? "" });
    }
  }
  return actions.sort((a, b) => `${a.file}#${a.name}`.localeCompare(`${b.file}#${b.name}`));
}
