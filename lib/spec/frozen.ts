import { NextResponse } from "next/server";

/**
 * What answers any attempt to edit an issued revision's content: 405, with the methods that do
 * exist in Allow (RFC 9110 §15.5.6) and a plain sentence about what to do instead.
 */
export function refuseEdit(allow: string) {
  return async () =>
    NextResponse.json(
      { error: "An issued revision never changes. Change the specification and issue a new revision instead." },
      { status: 405, headers: { Allow: allow } },
    );
}
