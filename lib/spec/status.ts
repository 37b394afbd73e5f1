/**
 * Where a line stands with its supplier, worked out from the order dates they recorded.
 * "Late" means it can no longer arrive by the install date as planned: not ordered by its
 * order-by date, or expected after the install date.
 */
export type LineStatus = "not-ordered" | "order-overdue" | "ordered" | "expected" | "arrives-late";

export type LineOrderDates = { orderedOn: string | null; expectedOn: string | null } | null | undefined;

export function lineStatus(input: {
  orderByDate: string | null;
  order: LineOrderDates;
  today: string;
  installDate: string | null;
}): LineStatus {
  const { orderByDate, order, today, installDate } = input;
  if (!order?.orderedOn) return orderByDate !== null && orderByDate < today ? "order-overdue" : "not-ordered";
  if (!order.expectedOn) return "ordered";
  return installDate !== null && order.expectedOn > installDate ? "arrives-late" : "expected";
}

export const lineStatusLabels: Record<LineStatus, string> = {
  "not-ordered": "Not ordered yet",
  "order-overdue": "Not ordered, order-by date passed",
  ordered: "Ordered",
  expected: "Delivery expected",
  "arrives-late": "Arrives after the install date",
};

export type StatusTone = "neutral" | "ok" | "caution" | "problem" | "info";

export const lineStatusTones: Record<LineStatus, StatusTone> = {
  "not-ordered": "neutral",
  "order-overdue": "problem",
  ordered: "info",
  expected: "ok",
  "arrives-late": "problem",
};

/** Lines that need someone to act: shown first and marked on every screen. */
export function isLate(status: LineStatus): boolean {
  return status === "order-overdue" || status === "arrives-late";
}
