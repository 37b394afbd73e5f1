"use server";

import { AuthError } from "next-auth";
import { isRedirectError } from "next/dist/client/components/redirect-error";
import { redirect } from "next/navigation";
import { signIn } from "@/lib/auth";
import { failure, formValues, type ActionResult } from "@/lib/actions/result";
import { safeCallback } from "@/lib/auth/callback";
import { linkRequestSchema, signInSchema } from "@/lib/validation/auth";

export async function signInWithPassword(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  const values = formValues(form);
  const parsed = signInSchema.safeParse(values);
  if (!parsed.success) return failure(parsed.error);
  try {
    await signIn("credentials", { ...parsed.data, redirectTo: safeCallback(values.callbackUrl) });
    return { ok: true, data: undefined };
  } catch (error) {
    if (isRedirectError(error)) throw error;
    if (error instanceof AuthError) {
      const throttled = "code" in error && error.code === "throttled";
      return {
        ok: false,
        status: throttled ? 429 : 401,
        error: throttled
          ? "Too many attempts. Wait 15 minutes, or sign in with an e-mailed link instead."
          : "That e-mail and password don't match an account. Check both, or sign in with an e-mailed link.",
      };
    }
    return failure(error);
  }
}

export async function requestSignInLink(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  const values = formValues(form);
  const parsed = linkRequestSchema.safeParse(values);
  if (!parsed.success) return failure(parsed.error);
  try {
    // redirect: false, then our own redirect: the client router cannot follow Auth.js's API-route redirect.
    await signIn("nodemailer", { email: parsed.data.email, redirectTo: safeCallback(values.callbackUrl), redirect: false });
  } catch (error) {
    if (isRedirectError(error)) throw error;
    return failure(error);
  }
  redirect("/sign-in/check-email");
}
