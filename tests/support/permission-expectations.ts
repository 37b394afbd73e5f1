import type { MatrixPersona } from "./personas";

/**
 * What each person gets from each page and route handler. Pages: "ok" (200), "sign-in" (sent to
 * sign in), "forbidden" (sent to the forbidden page), "not-found" (404), "home" (sent on to their
 * own home). Route handlers: the HTTP status. Writes are sent an empty JSON body, so a person who
 * may write gets 400 (nothing is written) and everyone else is refused before validation.
 */
export type Outcome = number | "ok" | "sign-in" | "forbidden" | "not-found" | "home";
export type Expectation = { path: string; body?: unknown; expect: Record<MatrixPersona, Outcome> };

/** Sample ids from the demo seed for each dynamic segment. */
export const FIXTURES: Record<string, string> = {
  projectId: "demo-project-marrow",
  boardId: "demo-board-kitchen-a",
  decisionId: "demo-decision-kitchen-pendant",
  revisionId: "demo-revision-a",
  finishId: "demo-finish-saltbush",
  variationId: "demo-variation-kb",
  lineId: "demo-spec-line-a-5",
  nextauth: "session",
};

const all = (o: Outcome): Record<MatrixPersona, Outcome> => ({
  owner: o, designer: o, other: o, client: o, otherclient: o, stone: o, joinery: o, anonymous: o,
});
const as = (base: Record<MatrixPersona, Outcome>, changes: Partial<Record<MatrixPersona, Outcome>>) => ({ ...base, ...changes });

/** Studio pages that aren't about one project: any studio's staff. */
export const studioPage = as(all("forbidden"), { owner: "ok", designer: "ok", other: "ok", anonymous: "sign-in" });
/** Pages of the demo project: its studio's staff; another studio gets 404. */
export const projectPage = as(studioPage, { other: "not-found" });
export const publicPage = all("ok");
/** Sign-in and sign-up send signed-in people on to their home. */
export const signedOutPage = as(all("home"), { anonymous: "ok" });
export const clientPage = as(all("forbidden"), { client: "ok", otherclient: "ok", anonymous: "sign-in" });
export const supplierPage = as(all("forbidden"), { stone: "ok", joinery: "ok", anonymous: "sign-in" });
export const signedInApi = as(all(200), { anonymous: 401 });

export const expectations: Record<string, Expectation> = {
  "GET /": { path: "/", expect: signedOutPage },
  "GET /sign-in": { path: "/sign-in", expect: signedOutPage },
  "GET /sign-in/check-email": { path: "/sign-in/check-email", expect: publicPage },
  "GET /sign-up": { path: "/sign-up", expect: signedOutPage },
  "GET /dev/mail": { path: "/dev/mail", expect: publicPage },
  "GET /style-check": { path: "/style-check", expect: publicPage },
  "GET /forbidden": { path: "/forbidden", expect: publicPage },
  "GET /home": { path: "/home", expect: as(all("home"), { anonymous: "sign-in" }) },
  "GET /welcome": { path: "/welcome", expect: as(all("ok"), { anonymous: "sign-in" }) },
  "GET /studio": { path: "/studio", expect: studioPage },
  "GET /studio/team": { path: "/studio/team", expect: studioPage },
  "GET /studio/projects/new": { path: "/studio/projects/new", expect: studioPage },
  "GET /studio/projects/[projectId]": { path: "/studio/projects/demo-project-marrow", expect: projectPage },
  "GET /client": { path: "/client", expect: clientPage },
  "GET /supplier": { path: "/supplier", expect: supplierPage },
  "GET /api/me": { path: "/api/me", expect: signedInApi },
  "GET /api/projects": { path: "/api/projects", expect: signedInApi },
  "GET /api/health": { path: "/api/health", expect: all(200) },
  "GET /api/dev/mail": { path: "/api/dev/mail", expect: all(200) },
  "GET /api/auth/[...nextauth]": { path: "/api/auth/session", expect: all(200) },
  "POST /api/auth/[...nextauth]": { path: "/api/auth/signout", expect: all("ok") },
};
