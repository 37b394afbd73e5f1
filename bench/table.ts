export type BenchRow = {
  measure: string;
  ours: string;
  baseline: string;
  ratio: string;
  target: string;
  met: "yes" | "no" | "–";
};

/** Prints benchmark rows as one aligned table. */
export function printTable(rows: BenchRow[]) {
  const headers: (keyof BenchRow)[] = ["measure", "ours", "baseline", "ratio", "target", "met"];
  const widths = headers.map((h) => Math.max(h.length, ...rows.map((r) => String(r[h]).length)));
  const line = (cells: string[]) => cells.map((c, i) => c.padEnd(widths[i] ?? 0)).join("  ");
  console.log(line(headers));
  console.log(line(widths.map((w) => "-".repeat(w))));
  for (const row of rows) console.log(line(headers.map((h) => String(row[h]))));
}
