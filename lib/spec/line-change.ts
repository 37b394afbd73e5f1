/**
 * Where an issued line stands against the decision it came from, when an approved variation has
 * changed that decision since the revision was issued (browser-safe: screens read it).
 *  - superseded: the line is out of date; a new revision is coming, and nobody orders it until then
 *    (or until the designer confirms the issued line stands);
 *  - confirmed: the designer said the issued line stands, after the latest such variation.
 */
export type LineChange =
  | { state: "superseded"; decisionTitle: string; variedAt: string | null }
  | { state: "confirmed"; decisionTitle: string; variedAt: string | null; confirmedAt: string; confirmedBy: string | null; note: string | null };

export function supersededReason(letter: string, change: Extract<LineChange, { state: "superseded" }>, variedOn: string | null): string {
  return `This line changed after revision ${letter} was issued: a variation to “${change.decisionTitle}” was approved${
    variedOn ? ` on ${variedOn}` : ""
  }. A new revision is coming; record an order once it arrives, or once the studio confirms this line stands.`;
}
