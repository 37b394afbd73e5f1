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
  supplierId: "demo-supplier-stone",
  nextauth: "session",
};

const all = (o: Outcome): Record<MatrixPersona, Outcome> => ({
  owner: o, designer: o, other: o, client: o, otherclient: o, stone: o, joinery: o, anonymous: o,
});
const as = (base: Record<MatrixPersona, Outcome>, changes: Partial<Record<MatrixPersona, Outcome>>) => ({ ...base, ...changes });

/** Studio pages that aren't about one project: the staff of every studio. */
export const studioPage = as(all("forbidden"), { owner: "ok", designer: "ok", other: "ok", anonymous: "sign-in" });
/** Pages of the demo project: its studio's staff; another studio gets 404. */
export const projectPage = as(studioPage, { other: "not-found" });
export const publicPage = all("ok");
/** Sign-in and sign-up send signed-in people on to their home. */
export const signedOutPage = as(all("home"), { anonymous: "ok" });
export const clientPage = as(all("forbidden"), { client: "ok", otherclient: "ok", anonymous: "sign-in" });
/** A client page of the demo project: its clients; another project's client gets 404. */
export const projectClientPage = as(all("forbidden"), { client: "ok", otherclient: "not-found", anonymous: "sign-in" });
export const supplierPage = as(all("forbidden"), { stone: "ok", joinery: "ok", anonymous: "sign-in" });
export const signedInApi = as(all(200), { anonymous: 401 });

/** Project-scoped JSON for staff only: clients and suppliers of the project 403, outsiders 404. */
const staffRead = { owner: 200, designer: 200, other: 404, client: 403, otherclient: 403, stone: 403, joinery: 403, anonymous: 401 };
/** Staff writes, sent an empty body: staff get 400 (nothing written), everyone else is refused first. */
const staffWrite = { ...staffRead, owner: 400, designer: 400 };
/** Things the project's clients read too (boards, decisions). */
const clientRead = { ...staffRead, client: 200, otherclient: 404 };
/** Client writes (choose, approve, request): the project's clients get 400 for an empty body. */
const clientWrite = { owner: 403, designer: 403, other: 403, client: 400, otherclient: 404, stone: 403, joinery: 403, anonymous: 401 };
/** The studio's own library: each studio's staff see their own; our finish ids are 404 to another studio. */
const libraryList = { owner: 200, designer: 200, other: 200, client: 403, otherclient: 403, stone: 403, joinery: 403, anonymous: 401 };
const libraryItem = { ...libraryList, other: 404 };
const libraryWrite = { ...libraryList, owner: 400, designer: 400, other: 400 };
const libraryItemWrite = { ...libraryItem, owner: 400, designer: 400 };

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
  "GET /studio/settings": { path: "/studio/settings", expect: studioPage },
  "GET /studio/projects/new": { path: "/studio/projects/new", expect: studioPage },
  "GET /studio/projects/[projectId]": { path: "/studio/projects/demo-project-marrow", expect: projectPage },
  "GET /client": { path: "/client", expect: clientPage },
  "GET /client/decisions": { path: "/client/decisions", expect: clientPage },
  "GET /client/boards/[boardId]": { path: "/client/boards/demo-board-kitchen-a", expect: projectClientPage },
  "GET /client/boards/[boardId]/print": { path: "/client/boards/demo-board-kitchen-a/print", expect: projectClientPage },
  "GET /client/decisions/[decisionId]": { path: "/client/decisions/demo-decision-kitchen-pendant", expect: projectClientPage },
  "GET /client/decisions/[decisionId]/approve/[optionId]": { path: "/client/decisions/demo-decision-kitchen-pendant/approve/demo-option-kp-opal", expect: projectClientPage },
  "GET /client/decisions/[decisionId]/variations/new": { path: "/client/decisions/demo-decision-kitchen-benchtop/variations/new", expect: projectClientPage },
  "GET /client/decisions/[decisionId]/variations/[variationId]": { path: "/client/decisions/demo-decision-kitchen-benchtop/variations/demo-variation-kb", expect: projectClientPage },
  "GET /supplier/revisions/[revisionId]": { path: "/supplier/revisions/demo-revision-a", expect: as(supplierPage, { joinery: "not-found" }) },
  "GET /studio/library": { path: "/studio/library", expect: studioPage },
  "GET /studio/library/new": { path: "/studio/library/new", expect: studioPage },
  "GET /studio/library/import": { path: "/studio/library/import", expect: studioPage },
  "GET /studio/library/[finishId]": { path: "/studio/library/demo-finish-saltbush", expect: projectPage },
  "GET /studio/suppliers": { path: "/studio/suppliers", expect: studioPage },
  "GET /studio/suppliers/new": { path: "/studio/suppliers/new", expect: studioPage },
  "GET /studio/suppliers/[supplierId]": { path: "/studio/suppliers/demo-supplier-stone", expect: projectPage },
  "GET /studio/library/[finishId]/edit": { path: "/studio/library/demo-finish-saltbush/edit", expect: projectPage },
  "GET /studio/projects/[projectId]/activity": { path: "/studio/projects/demo-project-marrow/activity", expect: projectPage },
  "GET /studio/projects/[projectId]/boards": { path: "/studio/projects/demo-project-marrow/boards", expect: projectPage },
  "GET /studio/projects/[projectId]/boards/[boardId]": { path: "/studio/projects/demo-project-marrow/boards/demo-board-kitchen-a", expect: projectPage },
  "GET /studio/projects/[projectId]/boards/[boardId]/print": { path: "/studio/projects/demo-project-marrow/boards/demo-board-kitchen-a/print", expect: projectPage },
  "GET /studio/projects/[projectId]/decisions": { path: "/studio/projects/demo-project-marrow/decisions", expect: projectPage },
  "GET /studio/projects/[projectId]/decisions/new": { path: "/studio/projects/demo-project-marrow/decisions/new", expect: projectPage },
  "GET /studio/projects/[projectId]/decisions/[decisionId]": { path: "/studio/projects/demo-project-marrow/decisions/demo-decision-kitchen-pendant", expect: projectPage },
  "GET /studio/projects/[projectId]/decisions/[decisionId]/edit": { path: "/studio/projects/demo-project-marrow/decisions/demo-decision-kitchen-pendant/edit", expect: projectPage },
  "GET /studio/projects/[projectId]/decisions/[decisionId]/variations/[variationId]": { path: "/studio/projects/demo-project-marrow/decisions/demo-decision-kitchen-benchtop/variations/demo-variation-kb", expect: projectPage },
  "GET /studio/projects/[projectId]/handoff": { path: "/studio/projects/demo-project-marrow/handoff", expect: projectPage },
  "GET /studio/projects/[projectId]/specification": { path: "/studio/projects/demo-project-marrow/specification", expect: projectPage },
  "GET /studio/projects/[projectId]/specification/print": { path: "/studio/projects/demo-project-marrow/specification/print", expect: projectPage },
  "GET /studio/projects/[projectId]/specification/fixed-items/new": { path: "/studio/projects/demo-project-marrow/specification/fixed-items/new", expect: projectPage },
  "GET /studio/projects/[projectId]/specification/fixed-items/[fixedItemId]": { path: "/studio/projects/demo-project-marrow/specification/fixed-items/demo-fixed-oven", expect: projectPage },
  "GET /studio/projects/[projectId]/specification/revisions/[revisionId]": { path: "/studio/projects/demo-project-marrow/specification/revisions/demo-revision-a", expect: projectPage },
  "GET /supplier": { path: "/supplier", expect: supplierPage },
  "GET /api/me": { path: "/api/me", expect: signedInApi },
  "GET /api/projects": { path: "/api/projects", expect: signedInApi },
  "GET /api/health": { path: "/api/health", expect: all(200) },
  "GET /api/dev/mail": { path: "/api/dev/mail", expect: all(200) },
  "GET /api/auth/[...nextauth]": { path: "/api/auth/session", expect: all(200) },
  "GET /api/projects/[projectId]/boards": { path: "/api/projects/demo-project-marrow/boards", expect: clientRead },
  "POST /api/projects/[projectId]/boards": { path: "/api/projects/demo-project-marrow/boards", expect: staffWrite },
  "GET /api/boards/[boardId]": { path: "/api/boards/demo-board-kitchen-a", expect: clientRead },
  "POST /api/boards/[boardId]/duplicate": { path: "/api/boards/demo-board-kitchen-a/duplicate", expect: staffWrite },
  "GET /api/boards/[boardId]/finishes": { path: "/api/boards/demo-board-kitchen-a/finishes", expect: staffRead },
  "POST /api/boards/[boardId]/items": { path: "/api/boards/demo-board-kitchen-a/items", expect: staffWrite },
  "PATCH /api/boards/[boardId]/items/[itemId]": { path: "/api/boards/demo-board-kitchen-a/items/demo-item-benchtop", expect: staffWrite },
  "DELETE /api/boards/[boardId]/items/[itemId]": { path: "/api/boards/demo-board-kitchen-a/items/demo-item-benchtop", expect: staffWrite },
  "POST /api/boards/[boardId]/items/order": { path: "/api/boards/demo-board-kitchen-a/items/order", expect: staffWrite },
  "POST /api/boards/[boardId]/pairs": { path: "/api/boards/demo-board-kitchen-a/pairs", expect: staffWrite },
  "PATCH /api/boards/[boardId]/pairs/[pairId]": { path: "/api/boards/demo-board-kitchen-a/pairs/demo-pair-bench-base", expect: staffWrite },
  "DELETE /api/boards/[boardId]/pairs/[pairId]": { path: "/api/boards/demo-board-kitchen-a/pairs/demo-pair-bench-base", expect: staffWrite },
  "GET /api/projects/[projectId]/decisions": { path: "/api/projects/demo-project-marrow/decisions", expect: clientRead },
  "POST /api/projects/[projectId]/decisions": { path: "/api/projects/demo-project-marrow/decisions", expect: staffWrite },
  "GET /api/decisions/[decisionId]": { path: "/api/decisions/demo-decision-kitchen-pendant", expect: clientRead },
  "PATCH /api/decisions/[decisionId]": { path: "/api/decisions/demo-decision-kitchen-pendant", expect: staffWrite },
  "POST /api/decisions/[decisionId]/send": { path: "/api/decisions/demo-decision-kitchen-pendant/send", expect: { ...staffWrite, owner: 200, designer: 200 } },
  "POST /api/decisions/[decisionId]/choice": { path: "/api/decisions/demo-decision-kitchen-pendant/choice", expect: clientWrite },
  "POST /api/decisions/[decisionId]/approve": { path: "/api/decisions/demo-decision-kitchen-pendant/approve", expect: clientWrite },
  "POST /api/decisions/[decisionId]/variations": { path: "/api/decisions/demo-decision-kitchen-benchtop/variations", expect: { ...clientWrite, owner: 400, designer: 400, other: 404 } },
  "POST /api/decisions/[decisionId]/variations/[variationId]/price": { path: "/api/decisions/demo-decision-kitchen-benchtop/variations/demo-variation-kb/price", expect: staffWrite },
  "POST /api/decisions/[decisionId]/variations/[variationId]/approve": { path: "/api/decisions/demo-decision-kitchen-benchtop/variations/no-such-variation/approve", expect: { ...clientWrite, client: 404 } },
  "POST /api/decisions/[decisionId]/variations/[variationId]/decline": { path: "/api/decisions/demo-decision-kitchen-benchtop/variations/no-such-variation/decline", expect: { ...clientWrite, client: 404 } },
  "POST /api/decisions/[decisionId]/variations/[variationId]/withdraw": { path: "/api/decisions/demo-decision-kitchen-benchtop/variations/no-such-variation/withdraw", expect: { ...clientWrite, client: 404, owner: 404, designer: 404, other: 404 } },
  // Each studio's staff read their own studio's markup and tax; only an owner changes them (the
  // other studio's owner gets 400 for the empty body, for their own studio).
  "GET /api/studio/settings": { path: "/api/studio/settings", expect: libraryList },
  "PATCH /api/studio/settings": { path: "/api/studio/settings", expect: { ...libraryList, owner: 400, designer: 403, other: 400 } },
  "GET /api/finishes": { path: "/api/finishes?category=stone", expect: libraryList },
  "POST /api/finishes": { path: "/api/finishes", expect: libraryWrite },
  "GET /api/finishes/[finishId]": { path: "/api/finishes/demo-finish-saltbush", expect: libraryItem },
  // An empty change is a valid change of nothing.
  "PATCH /api/finishes/[finishId]": { path: "/api/finishes/demo-finish-saltbush", expect: { ...libraryItemWrite, owner: 200, designer: 200 } },
  // A finish used by an issued specification can never be removed.
  "DELETE /api/finishes/[finishId]": { path: "/api/finishes/demo-finish-saltbush", expect: { ...libraryItemWrite, owner: 409, designer: 409 } },
  "GET /api/finishes/[finishId]/similar": { path: "/api/finishes/demo-finish-saltbush/similar?maxDeltaE=3", expect: libraryItem },
  "GET /api/finishes/export": { path: "/api/finishes/export", expect: libraryList },
  // CSV only: the matrix's empty JSON body is the wrong type (415) for the people allowed to import.
  "POST /api/finishes/import": { path: "/api/finishes/import", expect: { ...libraryWrite, owner: 415, designer: 415, other: 415 } },
  // The studio's directory: each studio's staff see their own; our supplier ids are 404 to another studio.
  "GET /api/suppliers": { path: "/api/suppliers?archived=1", expect: libraryList },
  "POST /api/suppliers": { path: "/api/suppliers", expect: libraryWrite },
  "GET /api/suppliers/[supplierId]": { path: "/api/suppliers/demo-supplier-stone", expect: libraryItem },
  // An empty change is a valid change of nothing.
  "PATCH /api/suppliers/[supplierId]": { path: "/api/suppliers/demo-supplier-stone", expect: { ...libraryItemWrite, owner: 200, designer: 200 } },
  // The stonemason has finishes and lines in an issued specification, so it can only be archived.
  "DELETE /api/suppliers/[supplierId]": { path: "/api/suppliers/demo-supplier-stone", expect: { ...libraryItemWrite, owner: 409, designer: 409 } },
  "POST /api/uploads": { path: "/api/uploads", expect: libraryWrite },
  // Files answer 404 alike for "no such file" and "not yours", so ids can't be probed.
  "GET /api/uploads/[imageId]/[variant]": { path: "/api/uploads/no-such-image/400", expect: as(all(404), { anonymous: 401 }) },
  "POST /api/uploads/[imageId]/measure": { path: "/api/uploads/no-such-image/measure", expect: { ...libraryItem, owner: 404, designer: 404 } },
  "GET /api/projects/[projectId]/fixed-items": { path: "/api/projects/demo-project-marrow/fixed-items", expect: staffRead },
  "POST /api/projects/[projectId]/fixed-items": { path: "/api/projects/demo-project-marrow/fixed-items", expect: staffWrite },
  "PATCH /api/projects/[projectId]/fixed-items/[fixedItemId]": { path: "/api/projects/demo-project-marrow/fixed-items/demo-fixed-oven", expect: { ...staffWrite, owner: 200, designer: 200 } },
  "DELETE /api/projects/[projectId]/fixed-items/[fixedItemId]": { path: "/api/projects/demo-project-marrow/fixed-items/demo-fixed-no-such", expect: { ...staffWrite, owner: 404, designer: 404 } },
  "GET /api/projects/[projectId]/revisions": { path: "/api/projects/demo-project-marrow/revisions", expect: { ...staffRead, otherclient: 404, stone: 200, joinery: 200 } },
  // Issuing needs no body, so it is tried on the other studio's project, whose specification is
  // empty: its own designer gets 409 (nothing to issue) and the demo project stays as it was.
  "POST /api/projects/[projectId]/revisions": { path: "/api/projects/demo-project-quarry/revisions", expect: { owner: 404, designer: 404, other: 409, client: 403, otherclient: 403, stone: 403, joinery: 403, anonymous: 401 } },
  "GET /api/revisions/[revisionId]": { path: "/api/revisions/demo-revision-a", expect: { ...staffRead, otherclient: 404, stone: 200, joinery: 404 } },
  "PATCH /api/revisions/[revisionId]": { path: "/api/revisions/demo-revision-a", expect: all(405) },
  "PUT /api/revisions/[revisionId]": { path: "/api/revisions/demo-revision-a", expect: all(405) },
  "DELETE /api/revisions/[revisionId]": { path: "/api/revisions/demo-revision-a", expect: all(405) },
  "GET /api/revisions/[revisionId]/export.csv": { path: "/api/revisions/demo-revision-a/export.csv?supplier=demo-supplier-stone", expect: { ...staffRead, otherclient: 404, stone: 200, joinery: 404 } },
  "POST /api/revisions/[revisionId]/acknowledge": { path: "/api/revisions/demo-revision-a/acknowledge", expect: { ...staffRead, owner: 403, designer: 403, other: 403, stone: 200, joinery: 404 } },
  "PATCH /api/revisions/[revisionId]/lines/[lineId]": { path: "/api/revisions/demo-revision-a/lines/demo-spec-line-a-5", expect: { ...staffRead, owner: 403, designer: 403, other: 403, stone: 200, joinery: 404 } },
  "PUT /api/revisions/[revisionId]/lines/[lineId]": { path: "/api/revisions/demo-revision-a/lines/demo-spec-line-a-5", expect: all(405) },
  "DELETE /api/revisions/[revisionId]/lines/[lineId]": { path: "/api/revisions/demo-revision-a/lines/demo-spec-line-a-5", expect: all(405) },
  // "The issued line stands", tried on a line no variation changed: the project's designers get 409
  // (nothing to confirm, nothing written), another studio 404, clients and suppliers 403.
  "POST /api/revisions/[revisionId]/lines/[lineId]/confirmation": {
    path: "/api/revisions/demo-revision-a/lines/demo-spec-line-a-5/confirmation",
    expect: { ...staffRead, owner: 409, designer: 409 },
  },
  // Corrections (project, rooms, people, staff, your own account). Removals are tried where they
  // are refused for everyone, so the seeded demo the other rows rely on stays as it was.
  "GET /account": { path: "/account", expect: as(all("ok"), { anonymous: "sign-in" }) },
  "PATCH /api/me": { path: "/api/me", expect: as(all(400), { anonymous: 401 }) },
  "PATCH /api/projects/[projectId]": { path: "/api/projects/demo-project-marrow", expect: staffWrite },
  "POST /api/projects/[projectId]/rooms": { path: "/api/projects/demo-project-marrow/rooms", expect: staffWrite },
  "PATCH /api/projects/[projectId]/rooms/[roomId]": { path: "/api/projects/demo-project-marrow/rooms/demo-room-kitchen", expect: staffWrite },
  // The kitchen has boards and decisions: 409 for staff, nothing removed.
  "DELETE /api/projects/[projectId]/rooms/[roomId]": { path: "/api/projects/demo-project-marrow/rooms/demo-room-kitchen", expect: { ...staffWrite, owner: 409, designer: 409 } },
  "PATCH /api/projects/[projectId]/members/[userId]": { path: "/api/projects/demo-project-marrow/members/demo-user-client2", expect: staffWrite },
  // Another project's client is not on this one: 404 for staff, nobody removed.
  "DELETE /api/projects/[projectId]/members/[userId]": { path: "/api/projects/demo-project-marrow/members/demo-user-otherclient", expect: { ...staffWrite, owner: 404, designer: 404 } },
  // Owners only; the other studio's owner finds nobody of ours (404).
  "PATCH /api/studio/staff/[userId]": { path: "/api/studio/staff/demo-user-designer", expect: { ...staffRead, owner: 400, designer: 403 } },
  // The demo studio's only owner: never removed (409).
  "DELETE /api/studio/staff/[userId]": { path: "/api/studio/staff/demo-user-owner", expect: { ...staffRead, owner: 409, designer: 403 } },
  // Without Auth.js's CSRF token a sign-out is refused with a redirect to the error page.
  "POST /api/auth/[...nextauth]": { path: "/api/auth/signout", expect: all(302) },
};
