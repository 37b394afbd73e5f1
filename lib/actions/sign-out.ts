"use server";

import { endSessionsSealedWith } from "@/db/queries/sessions";
import { sessionClaims, signOut } from "@/lib/auth";

/**
 * Signs out everywhere: the person's session version goes up (through the write queue, so every
 * cached check goes stale), which ends this cookie, any copy of it, and their other devices'
 * sessions at their next request. Then Auth.js clears the cookie here.
 */
export async function signOutAction() {
  const claims = await sessionClaims();
  // Only a session that still stands can end the others: an old, already-ended cookie cannot
  // keep signing the person out of their new sessions.
  if (claims) await endSessionsSealedWith(claims.userId, claims.sessionVersion);
  await signOut({ redirectTo: "/sign-in" });
}
