import { ZodError } from "zod";
import { fieldErrorsOf, HttpError, type FieldErrors } from "@/lib/http-error";

/** What was typed, sent back with a refused submit so the form (with or without JavaScript) shows it again. */
export type KeptValues = Record<string, string>;

/** What every server action returns: forms show `error` and `fieldErrors` beside the fields. */
export type ActionResult<T = undefined> =
  | { ok: true; data: T }
  | { ok: false; error: string; fieldErrors?: FieldErrors; status?: number; values?: KeptValues };

type Failure = { ok: false; error: string; fieldErrors?: FieldErrors; status?: number; values?: KeptValues };

export const idle = { ok: false, error: "" } as const satisfies ActionResult;

/**
 * Turns a thrown error into an action result; unexpected errors are logged and answered generically.
 * Pass `values` (from `keptValues`) to send what was typed back to the form.
 */
export function failure(error: unknown, values?: KeptValues): Failure {
  const kept = values ? { values } : {};
  if (error instanceof HttpError) return { ok: false, error: error.message, fieldErrors: error.fieldErrors, status: error.status, ...kept };
  if (error instanceof ZodError) return { ok: false, error: "Some fields need attention.", fieldErrors: fieldErrorsOf(error), status: 400, ...kept };
  console.error(error);
  return { ok: false, error: "Something went wrong on our side. Nothing was changed; please try again.", status: 500, ...kept };
}

/** A form's text fields; 400 when any holds a NUL character (SQLite would keep it, and readers stop at it). */
export function formValues(form: FormData): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [key, value] of form.entries()) {
    if (typeof value !== "string") continue;
    if (value.includes("\u0000")) throw new HttpError(400, "Text can't contain the NUL character (U+0000). Remove it and try again.", { [key]: ["Remove the NUL character (U+0000)."] });
    out[key] = value;
  }
  return out;
}

/**
 * The text a person typed, to echo back on a refused submit: never React's own `$ACTION_…`
 * fields (they carry the previous state), never the fields named in `omit` (passwords).
 */
export function keptValues(form: FormData, omit: readonly string[] = []): KeptValues {
  const out: KeptValues = {};
  for (const [key, value] of form.entries()) {
    if (typeof value !== "string" || key.startsWith("$ACTION") || omit.includes(key)) continue;
    out[key] = value;
  }
  return out;
}

/** A field's value echoed back by a refused submit, or `fallback` before any submit. */
export function keptValue(state: ActionResult<unknown>, name: string, fallback = ""): string {
  if (state.ok) return fallback;
  return state.values?.[name] ?? fallback;
}

/** The first of `order` (the form's fields, top to bottom) that a refused submit found fault with. */
export function firstInvalid(state: ActionResult<unknown>, order: readonly string[]): string | undefined {
  if (state.ok || !state.fieldErrors) return undefined;
  const errors = state.fieldErrors;
  return order.find((name) => (errors[name]?.length ?? 0) > 0);
}
