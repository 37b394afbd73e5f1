import { createClient } from "@libsql/client";
import fc from "fast-check";
import { afterAll, describe, expect, it } from "vitest";
import { discoverRoutes } from "@/tests/support/app-routes";
import { expectations, type Outcome } from "@/tests/support/permission-expectations";
import { actAs, type Persona } from "@/tests/support/session";

/**
 * Every write route handler, sent malformed bodies by someone allowed to write there: wrong types,
 * huge strings, odd unicode, negative, fractional or non-finite money, impossible dates, not-JSON.
 * The answer is always a 4xx with a message (never a 500), and a refused request changes no row.
 */
const SEGMENT_IDS: Record<string, string> = {
  projectId: "demo-project-marrow",
  boardId: "demo-board-kitchen-a",
  itemId: "demo-item-benchtop",
  pairId: "demo-pair-bench-base",
  decisionId: "demo-decision-kitchen-pendant",
  variationId: "demo-variation-kb",
  finishId: "demo-finish-saltbush",
  fixedItemId: "demo-fixed-oven",
  revisionId: "demo-revision-a",
  lineId: "demo-spec-line-a-5",
  imageId: "no-such-image",
  supplierId: "demo-supplier-stone",
};
const KEYS = [
  "title", "roomId", "allowanceCents", "dueDate", "options", "label", "priceCents", "notes", "lines", "finishId",
  "quantity", "unit", "optionId", "comment", "confirm", "reason", "priceDeltaCents", "timeImpactDays", "version",
  "x", "y", "width", "height", "itemAId", "itemBId", "intent", "accessRelevant", "order", "name", "category",
  "productCode", "surface", "format", "unitPriceCents", "leadTimeDays", "cautions", "hex", "lab", "lrv", "item",
  "location", "orderedOn", "expectedOn", "boardId", "supplierId", "trade", "contacts", "archived", "email", "phone",
  "accountNumber",
];
const odd = fc.constantFrom("\u0000", "\u202e\u202dabc", "𝕏🏠👩🏽‍🔧", "\ud800", "' OR 1=1 --", "<script>alert(1)</script>", "../../etc/passwd", "", " ");
const money = fc.constantFrom(-1, -0.5, 0.5, 12.345, 1e308, -1e308, Number.MAX_SAFE_INTEGER + 2, "NaN", "Infinity", "12,50", "$10");
const dates = fc.constantFrom("2027-02-30", "2026-13-01", "0000-00-00", "yesterday", "2026-12-01T25:00:00Z", "99999-01-01", "1899-12-31");
const hostileValue = fc.oneof(
  fc.string({ maxLength: 30 }), fc.constant("x".repeat(200_000)), odd, money, dates, fc.boolean(), fc.constant(null),
  fc.double(), fc.integer(), fc.array(fc.jsonValue({ maxDepth: 2 }), { maxLength: 4 }), fc.dictionary(fc.string({ maxLength: 5 }), fc.string({ maxLength: 5 })),
);
const hostileBody = fc.oneof(
  fc.record(Object.fromEntries(KEYS.map((k) => [k, hostileValue])), { requiredKeys: [] }).map((o) => JSON.stringify(o)),
  fc.jsonValue({ maxDepth: 3 }).map((v) => JSON.stringify(v)),
  fc.constantFrom("{", "NaN", "", "null", "[]", '{"confirm":"yes"}', "\u0000", "x".repeat(100_000)),
);

const url = process.env.DATABASE_URL ?? "";
const counter = createClient({ url });
afterAll(() => counter.close());

async function rowCounts(): Promise<string> {
  const { rows } = await counter.execute(
    "select name from sqlite_master where type = 'table' and name not like 'sqlite_%' and name not like '__drizzle%' and name not in ('sign_in_throttle', 'audit_log') order by name",
  );
  const parts = await Promise.all(rows.map(async (r) => {
    const n = await counter.execute(`select count(*) as n from "${String(r.name)}"`);
    return `${String(r.name)}=${String(n.rows[0]?.n)}`;
  }));
  return parts.join(",");
}

function writer(expect: Record<string, Outcome>): Persona | null {
  const order: Persona[] = ["designer", "owner", "client", "stone", "other"];
  return order.find((p) => typeof expect[p] === "number" && (expect[p] as number) < 500 && expect[p] !== 401 && expect[p] !== 403 && expect[p] !== 404 && expect[p] !== 405) ?? null;
}

type Handler = (request: Request, context: { params: Promise<Record<string, string>> }) => Promise<Response>;
let cases = 0;

describe("hostile input to every write route", () => {
  const routes = discoverRoutes().filter((r) => r.kind === "api" && r.method !== "GET" && !r.pattern.startsWith("/api/auth"));

  it.each(routes.map((r) => [`${r.method} ${r.pattern}`, r] as const))("%s", { timeout: 120_000 }, async (key, route) => {
    const expectation = expectations[key];
    const persona = expectation ? writer(expectation.expect) : null;
    if (!persona) return; // every caller is refused before reading a body (the matrix checks that)
    actAs(persona);
    const mod = (await import(route.file)) as Record<string, Handler>;
    const handler = mod[route.method];
    if (!handler) throw new Error(`${key}: no ${route.method} export`);
    const params = Object.fromEntries([...route.pattern.matchAll(/\[(\w+)\]/g)].map((m) => [m[1] ?? "", SEGMENT_IDS[m[1] ?? ""] ?? "x"]));
    const path = route.pattern.replace(/\[(\w+)\]/g, (_, name: string) => SEGMENT_IDS[name] ?? "x");
    await fc.assert(
      fc.asyncProperty(hostileBody, async (body) => {
        cases++;
        const before = await rowCounts();
        const res = await handler(new Request(`http://test${path}`, { method: route.method, headers: { "content-type": "application/json", origin: "http://mottle.test" }, body }), { params: Promise.resolve(params) });
        expect(res.status, `${key} answered ${res.status} to ${body.slice(0, 120)}`).toBeLessThan(500);
        if (res.status >= 400) {
          const json = (await res.json()) as { error?: unknown };
          expect(typeof json.error).toBe("string");
          expect(await rowCounts()).toBe(before);
        }
      }),
      { numRuns: 20, seed: 20261201 },
    );
  });

  afterAll(() => {
    console.log(`hostile input: ${cases} cases across ${routes.length} write routes`);
  });
});
