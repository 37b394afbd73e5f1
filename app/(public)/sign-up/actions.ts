"use server";

import { isRedirectError } from "next/dist/client/components/redirect-error";
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { createStudioWithOwner } from "@/db/queries/studios";
import { signIn } from "@/lib/auth";
import { failure, formValues, keptValues, type ActionResult } from "@/lib/actions/result";
import { allowSignUp } from "@/lib/auth/limits";
import { forSignUp } from "@/lib/auth/link-mail";
import { clientAddress } from "@/lib/client-address";
import { signUpSchema } from "@/lib/validation/auth";

// The same words whether the address was new (its studio is saved) or already had an account
// (nothing changed), so they say nothing about accounts, and neither claims nothing was saved.
const SAVED_BUT_NOT_SENT =
  "We couldn't send the e-mail to finish. Anything you started is saved: go to the sign-in page and ask for a sign-in link for this address.";

/**
 * Sign-up always ends at "check your e-mail", whether or not the address already has an account,
 * so the form cannot be used to find out who has one. A new address gets its studio and owner
 * (with the password chosen here) and an e-mail with a sign-in link to finish; an address that
 * already has an account is left as it was and gets an e-mail saying someone tried, with a
 * sign-in link. The e-mail goes out after the answer (lib/auth/link-mail.ts).
 */
export async function signUp(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  // Sent back with a refused submit so the form shows it again; never the password.
  const typed = () => keptValues(form, ["password"]);
  let saved = false;
  try {
    const values = formValues(form);
    const parsed = signUpSchema.safeParse(values);
    if (!parsed.success) return failure(parsed.error, typed());
    await allowSignUp(parsed.data.email, clientAddress(await headers()));
    // One transaction: it writes the studio, owner and audit entry together, or nothing.
    const { created } = await createStudioWithOwner(parsed.data);
    saved = true;
    await forSignUp(created, () => signIn("nodemailer", { email: parsed.data.email, redirectTo: "/home", redirect: false }));
  } catch (error) {
    if (isRedirectError(error)) throw error;
    if (saved) {
      console.error(error);
      return { ok: false, status: 500, error: SAVED_BUT_NOT_SENT, values: typed() };
    }
    return failure(error, typed());
  }
  redirect("/sign-in/check-email?from=sign-up");
}
