"use server";

import { isRedirectError } from "next/dist/client/components/redirect-error";
import { createStudioWithOwner } from "@/db/queries/studios";
import { signIn } from "@/lib/auth";
import { failure, formValues, type ActionResult } from "@/lib/actions/result";
import { signUpSchema } from "@/lib/validation/auth";

/** Sign-up creates a studio and its owner, then signs the owner in. */
export async function signUp(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  const parsed = signUpSchema.safeParse(formValues(form));
  if (!parsed.success) return failure(parsed.error);
  try {
    await createStudioWithOwner(parsed.data);
    await signIn("credentials", { email: parsed.data.email, password: parsed.data.password, redirectTo: "/studio" });
    return { ok: true, data: undefined };
  } catch (error) {
    if (isRedirectError(error)) throw error;
    return failure(error);
  }
}
