/** "adds 10 days to the programme", "no change to the programme", "saves 3 days". */
export function describeTimeImpact(days: number | null): string {
  if (!days) return "no change to the programme";
  const n = Math.abs(days);
  return days > 0 ? `adds ${n} ${n === 1 ? "day" : "days"} to the programme` : `saves ${n} ${n === 1 ? "day" : "days"}`;
}
