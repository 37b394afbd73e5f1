/** Calendar arithmetic on YYYY-MM-DD days, in UTC so a day never shifts with the server's zone. */
export function shiftDay(isoDay: string, days: number): string {
  const date = new Date(`${isoDay}T00:00:00Z`);
  if (Number.isNaN(date.getTime())) throw new RangeError(`not a calendar day: ${isoDay}`);
  date.setUTCDate(date.getUTCDate() + days);
  return date.toISOString().slice(0, 10);
}

/**
 * The last day to place an order and still have it on site for the install: the install date
 * minus the lead time (common practice; DOMAIN.md, "How the work runs"). Null without an install date.
 */
export function orderByDate(installDate: string | null | undefined, leadTimeDays: number): string | null {
  if (!installDate) return null;
  return shiftDay(installDate, -Math.max(0, Math.round(leadTimeDays)));
}
