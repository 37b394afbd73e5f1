/**
 * The kinds of entry the activity log can be filtered by, and which audit actions each holds.
 * Browser-safe: the page's filter and the query share it.
 */
export const activityKinds = {
  decisions: { label: "Decisions", actions: ["decision.created", "decision.updated", "decision.sent", "decision.repriced"], prefixes: [] },
  picks: { label: "Picks", actions: ["option.chosen"], prefixes: [] },
  approvals: { label: "Approvals", actions: ["decision.approved"], prefixes: [] },
  variations: { label: "Variations", actions: [], prefixes: ["variation."] },
  boards: { label: "Sample boards", actions: [], prefixes: ["board."] },
  specification: { label: "Specification and revisions", actions: ["revision.issued", "line.confirmed"], prefixes: ["fixed-item."] },
  suppliers: { label: "Suppliers' acknowledgements and orders", actions: ["revision.acknowledged", "line.order-dates"], prefixes: [] },
  people: { label: "People", actions: ["client.invited", "supplier.invited"], prefixes: ["member.", "invitation.", "account."] },
  project: { label: "Project and rooms", actions: [], prefixes: ["project.", "room."] },
  uploads: { label: "Uploads", actions: [], prefixes: ["image."] },
} as const satisfies Record<string, { label: string; actions: readonly string[]; prefixes: readonly string[] }>;

export type ActivityKind = keyof typeof activityKinds;

export function isActivityKind(value: unknown): value is ActivityKind {
  return typeof value === "string" && Object.hasOwn(activityKinds, value);
}

/** Board edits are saved one by one; the log shows one person's run of edits on one board as one entry. */
export const BOARD_EDIT_GAP_MS = 5 * 60_000;
export const boardEditActions = [
  "board.item-added",
  "board.item-changed",
  "board.item-removed",
  "board.items-reordered",
  "board.pair-added",
  "board.pair-changed",
  "board.pair-removed",
] as const;
export type BoardEditAction = (typeof boardEditActions)[number];

export const ACTIVITY_PAGE_SIZE = 50;
