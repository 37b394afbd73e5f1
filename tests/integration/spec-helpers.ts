import { sessionStub, type Persona } from "@/tests/support/session";

/** Demo supplier contacts beyond the personas tests/support/session.ts names. */
export type SpecPersona = Persona | "flooring" | "tiles" | "lighting" | "appliances";

export function actAsAny(persona: SpecPersona) {
  sessionStub.current =
    persona === "anonymous" ? null : { user: { id: `demo-user-${persona}` }, expires: new Date(Date.now() + 3_600_000).toISOString() };
}

export const project = "demo-project-marrow";
export const revisionA = "demo-revision-a";
export const stone = "demo-supplier-stone";
export const appliances = "demo-supplier-appliances";

type Handler<P> = (request: Request, context: { params: Promise<P> }) => Promise<Response>;

/** Calls a route handler the way Next does: a Request and a promise of the route's params. */
export async function call<P>(handler: Handler<P>, params: P, init: { method?: string; path?: string; body?: unknown } = {}) {
  const request = new Request(`http://test${init.path ?? "/api"}`, {
    method: init.method ?? "GET",
    ...(init.body === undefined
      ? { headers: { origin: "http://mottle.test" } }
      : { body: JSON.stringify(init.body), headers: { "content-type": "application/json", origin: "http://mottle.test" } }),
  });
  const response = await handler(request, { params: Promise.resolve(params) });
  const text = await response.text();
  const type = response.headers.get("content-type") ?? "";
  const body: unknown = type.includes("json") && text ? JSON.parse(text) : text;
  return { status: response.status, body: body as Record<string, unknown> & { error?: string }, text, headers: response.headers };
}
