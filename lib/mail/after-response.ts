import "server-only";
import { after } from "next/server";

/**
 * Runs `work` once the answer has gone out (Next's `after`), so nobody waits on a mail server to
 * see their change saved. Outside a request (scripts, tests that call a handler directly) there
 * is nothing to answer first, and the work simply runs now.
 */
export async function afterResponse(work: () => Promise<void>): Promise<void> {
  try {
    after(work);
  } catch {
    // `after` refuses outside a request scope.
    await work();
  }
}
