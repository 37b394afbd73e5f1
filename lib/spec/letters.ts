/**
 * Revision letters run A…Z, then AA, AB… (bijective base 26, as spreadsheet columns are named),
 * so the letter follows from the sequence and two revisions of a project never share one.
 */
export function letterForSequence(sequence: number): string {
  if (!Number.isInteger(sequence) || sequence < 1) throw new RangeError("a revision sequence starts at 1");
  let n = sequence;
  let letters = "";
  while (n > 0) {
    const rest = (n - 1) % 26;
    letters = String.fromCharCode(65 + rest) + letters;
    n = Math.floor((n - 1) / 26);
  }
  return letters;
}
