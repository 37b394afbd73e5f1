/** Calendar days are YYYY-MM-DD in UTC, as everywhere in Mottle. */
export function shiftDay(isoDay: string, days: number): string {
  const date = new Date(`${isoDay}T00:00:00Z`);
  date.setUTCDate(date.getUTCDate() + days);
  return date.toISOString().slice(0, 10);
}

export type LeadTimeFinish = { name: string; leadTimeDays: number };

export type OrderBySuggestion = {
  /** The last day to order so the slowest of the finishes given arrives by install. */
  date: string;
  leadTimeDays: number;
  /** The finish that sets the date. */
  finishName: string;
};

/**
 * Order-by = install date minus the longest lead time among the finishes given. The caller picks
 * which: for an open decision every offered option's (the client may pick any, so the slowest
 * sets the date); for a locked one only the option it carries (db/queries/decisions.ts loadOrderBy).
 * [published: trade process pages, see DOMAIN.md — "order-by dates follow from install date minus lead time"]
 */
export function suggestOrderBy(installDate: string | null | undefined, finishes: readonly LeadTimeFinish[]): OrderBySuggestion | null {
  if (!installDate || finishes.length === 0) return null;
  let slowest = finishes[0];
  for (const f of finishes) if (slowest && f.leadTimeDays > slowest.leadTimeDays) slowest = f;
  if (!slowest) return null;
  return { date: shiftDay(installDate, -slowest.leadTimeDays), leadTimeDays: slowest.leadTimeDays, finishName: slowest.name };
}

/** A due date after the order-by date leaves no time to order once the client decides. */
export function isDueAfterOrderBy(dueDate: string, orderBy: OrderBySuggestion | null): boolean {
  return orderBy !== null && dueDate > orderBy.date;
}
