import { sessionStub } from "./session";

type Handler<P> = (request: Request, context: { params: Promise<P> }) => Promise<Response>;
export type Reply = { status: number; body: Record<string, unknown> };

/** Calls a route handler the way Next would, with JSON in and out. */
export async function call<P>(handler: Handler<P>, params: P, init: { method?: string; body?: unknown; raw?: string } = {}): Promise<Reply> {
  const method = init.method ?? (init.body === undefined && init.raw === undefined ? "GET" : "POST");
  const request = new Request("http://test/api", {
    method,
    headers: { "content-type": "application/json", origin: "http://mottle.test" },
    body: init.raw ?? (init.body === undefined ? undefined : JSON.stringify(init.body)),
  });
  const res = await handler(request, { params: Promise.resolve(params) });
  const text = await res.text();
  return { status: res.status, body: text ? (JSON.parse(text) as Record<string, unknown>) : {} };
}

/** Act as a given user id (for people the demo personas don't cover). */
export function actAsUser(userId: string) {
  sessionStub.current = { user: { id: userId }, expires: new Date(Date.now() + 3_600_000).toISOString() };
}

export const demo = {
  project: "demo-project-marrow",
  otherProject: "demo-project-quarry",
  pendant: "demo-decision-kitchen-pendant",
  splashback: "demo-decision-kitchen-splashback",
  ensuiteFloor: "demo-decision-ensuite-floor",
  cabinets: "demo-decision-kitchen-cabinets",
  benchtop: "demo-decision-kitchen-benchtop",
  laundry: "demo-decision-laundry-benchtop",
  option: (key: string) => `demo-option-${key}`,
  finish: (key: string) => `demo-finish-${key}`,
  room: (key: string) => `demo-room-${key}`,
};

/** A calendar day `days` from today (UTC). */
export function dayFromToday(days: number) {
  const d = new Date();
  d.setUTCDate(d.getUTCDate() + days);
  return d.toISOString().slice(0, 10);
}

/** A valid create-decision body; override what a test is about. */
export function newDecisionBody(overrides: Record<string, unknown> = {}) {
  return {
    room: demo.room("kitchen"),
    title: "Open shelf timber",
    allowanceCents: 120000,
    dueDate: dayFromToday(30),
    options: [
      { label: "Natural oak", priceCents: 98000, notes: "Matches the island panel.", lines: [{ finishId: demo.finish("cab-oak-natural"), quantity: 1.2, unit: "m²" }] },
      { label: "Walnut", priceCents: 134000, lines: [{ finishId: demo.finish("cab-walnut"), quantity: 1.2, unit: "m²" }] },
    ],
    ...overrides,
  };
}
