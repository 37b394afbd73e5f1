"use server";

import { AuthError } from "next-auth";
import { isRedirectError } from "next/dist/client/components/redirect-error";
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { signIn } from "@/lib/auth";
import { failure, formValues, keptValues, type ActionResult } from "@/lib/actions/result";
import { safeCallback } from "@/lib/auth/callback";
import { allowSignInLink } from "@/lib/auth/limits";
import { rememberThisDevice } from "@/lib/auth/remember-device";
import { waitWords } from "@/lib/auth/too-many";
import { clientAddress } from "@/lib/client-address";
import { linkRequestSchema, signInSchema } from "@/lib/validation/auth";

const FIFTEEN_MINUTES_S = 15 * 60;

/** Seconds to wait, from the error authorize() threw for a limited address (lib/auth/index.ts). */
function retryAfterOf(error: AuthError): number {
  return "retryAfterSeconds" in error && typeof error.retryAfterSeconds === "number" ? error.retryAfterSeconds : FIFTEEN_MINUTES_S;
}

/** Sent back with a refused submit so the form shows it again; never the password. */
const typedIn = (form: FormData) => keptValues(form, ["password"]);

export async function signInWithPassword(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  let values: Record<string, string> = {};
  try {
    values = formValues(form);
    const parsed = signInSchema.safeParse(values);
    if (!parsed.success) return failure(parsed.error, typedIn(form));
    await signIn("credentials", { ...parsed.data, redirectTo: safeCallback(values.callbackUrl) });
    return { ok: true, data: undefined };
  } catch (error) {
    if (isRedirectError(error)) {
      // Signed in: this browser is now known for this account (db/queries/passwords.ts).
      await rememberThisDevice(signInSchema.shape.email.parse(values.email));
      throw error;
    }
    const kept = typedIn(form);
    if (error instanceof AuthError) {
      const throttled = "code" in error && error.code === "throttled";
      return {
        ok: false,
        status: throttled ? 429 : 401,
        values: kept,
        error: throttled
          ? `Too many sign-in attempts from here. Wait ${waitWords(retryAfterOf(error))}, or sign in with an e-mailed link instead.`
          : "That e-mail and password don't match an account. Check both, or sign in with an e-mailed link.",
      };
    }
    return failure(error, kept);
  }
}

export async function requestSignInLink(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  try {
    const values = formValues(form);
    const parsed = linkRequestSchema.safeParse(values);
    if (!parsed.success) return failure(parsed.error, typedIn(form));
    await allowSignInLink(parsed.data.email, clientAddress(await headers()));
    // redirect: false, then our own redirect: the client router cannot follow Auth.js's API-route redirect.
    await signIn("nodemailer", { email: parsed.data.email, redirectTo: safeCallback(values.callbackUrl), redirect: false });
  } catch (error) {
    if (isRedirectError(error)) throw error;
    return failure(error, typedIn(form));
  }
  redirect("/sign-in/check-email");
}
