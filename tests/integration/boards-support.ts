import { createClient } from "@libsql/client";
import { markWritten } from "@/db/queries/read-cache";

/** Calls a route handler as the browser would and reads its JSON. */
export async function callRoute<P extends Record<string, string>>(
  handler: (request: Request, context: { params: Promise<P> }) => Promise<Response>,
  path: string,
  params: P,
  init: { method?: string; body?: unknown } = {},
) {
  const request = new Request(`http://test${path}`, {
    method: init.method ?? "GET",
    headers: init.body === undefined ? { origin: "http://mottle.test" } : { "content-type": "application/json", origin: "http://mottle.test" },
    body: init.body === undefined ? undefined : JSON.stringify(init.body),
  });
  const res = await handler(request, { params: Promise.resolve(params) });
  return { status: res.status, body: (await res.json()) as Record<string, unknown> & { error?: string } };
}

/** Straight to the test database, for arranging rows and for reading what was really saved. */
export async function sql<T = Record<string, unknown>>(statement: string, args: (string | number | null)[] = []): Promise<T[]> {
  const client = createClient({ url: process.env.DATABASE_URL ?? "" });
  try {
    const { rows } = await client.execute({ sql: statement, args });
    return rows as unknown as T[];
  } finally {
    client.close();
    // Behind the app's back: whatever it has cached may be stale now.
    markWritten();
  }
}

export const BOARD = "demo-board-kitchen-a";
export const PROJECT = "demo-project-marrow";
