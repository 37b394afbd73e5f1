import { ZodError } from "zod";
import { fieldErrorsOf, HttpError, type FieldErrors } from "@/lib/http";

/** What every server action returns: forms show `error` and `fieldErrors` beside the fields. */
export type ActionResult<T = undefined> =
  | { ok: true; data: T }
  | { ok: false; error: string; fieldErrors?: FieldErrors; status?: number };

export const idle = { ok: false, error: "" } as const satisfies ActionResult;

/** Turns a thrown error into an action result; unexpected errors are logged and answered generically. */
export function failure(error: unknown): { ok: false; error: string; fieldErrors?: FieldErrors; status?: number } {
  if (error instanceof HttpError) return { ok: false, error: error.message, fieldErrors: error.fieldErrors, status: error.status };
  if (error instanceof ZodError) return { ok: false, error: "Some fields need attention.", fieldErrors: fieldErrorsOf(error), status: 400 };
  console.error(error);
  return { ok: false, error: "Something went wrong on our side. Nothing was changed; please try again.", status: 500 };
}

export function formValues(form: FormData): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [key, value] of form.entries()) if (typeof value === "string") out[key] = value;
  return out;
}
