/** "22 Mar 2027": short enough for a table cell, unambiguous on either side of the Pacific. */
export function formatShortDay(isoDay: string): string {
  const date = new Date(`${isoDay}T00:00:00Z`);
  if (Number.isNaN(date.getTime())) return isoDay;
  return new Intl.DateTimeFormat("en-AU", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" }).format(date);
}

/** A CSS string literal for generated content (print headers and footers): no way out of the quotes. */
export function cssString(value: string): string {
  return `"${value.replace(/[\\"]/g, (c) => `\\${c}`).replace(/[\n\r<>]/g, " ")}"`;
}
