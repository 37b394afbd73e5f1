/** Dates are stored as UTC days (YYYY-MM-DD) and shown the way people write them: "Fri 18 Dec 2026". */
export function formatDay(isoDay: string | null | undefined): string {
  if (!isoDay) return "not set";
  const date = new Date(`${isoDay}T00:00:00Z`);
  if (Number.isNaN(date.getTime())) return isoDay;
  return new Intl.DateTimeFormat("en-AU", { weekday: "short", day: "numeric", month: "short", year: "numeric", timeZone: "UTC" }).format(date);
}

export function daysBetween(fromIsoDay: string, toIsoDay: string): number {
  const ms = Date.parse(`${toIsoDay}T00:00:00Z`) - Date.parse(`${fromIsoDay}T00:00:00Z`);
  return Math.round(ms / 86_400_000);
}

/** "due in 3 days", "due today", "4 days late". */
export function describeDue(dueIsoDay: string, todayIsoDay: string): string {
  const days = daysBetween(todayIsoDay, dueIsoDay);
  if (days === 0) return "due today";
  if (days === 1) return "due tomorrow";
  if (days > 1) return `due in ${days} days`;
  return days === -1 ? "1 day late" : `${-days} days late`;
}
