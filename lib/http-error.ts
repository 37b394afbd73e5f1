import type { ZodError } from "zod";

export type FieldErrors = Record<string, string[]>;

/** An error that is the caller's to fix (or not theirs to see); its message is safe to show. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly fieldErrors?: FieldErrors,
  ) {
    super(message);
  }
}

export const unauthorised = () => new HttpError(401, "Sign in to continue.");
export const forbidden = () => new HttpError(403, "You don't have access to this.");
export const notFound = (what = "That") => new HttpError(404, `${what} was not found.`);
export const conflict = (message: string) => new HttpError(409, message);

export function fieldErrorsOf(error: ZodError): FieldErrors {
  const out: FieldErrors = {};
  for (const issue of error.issues) {
    const key = issue.path.join(".") || "_";
    (out[key] ??= []).push(issue.message);
  }
  return out;
}
