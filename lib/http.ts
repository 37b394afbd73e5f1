import { NextResponse } from "next/server";
import { ZodError } from "zod";

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

export function errorResponse(error: unknown): NextResponse {
  if (error instanceof HttpError) {
    return NextResponse.json({ error: error.message, fieldErrors: error.fieldErrors }, { status: error.status });
  }
  if (error instanceof ZodError) {
    return NextResponse.json({ error: "Some fields need attention.", fieldErrors: fieldErrorsOf(error) }, { status: 400 });
  }
  console.error(error);
  return NextResponse.json({ error: "Something went wrong on our side. Nothing was changed; please try again." }, { status: 500 });
}

type Handler<C> = (request: Request, context: C) => Promise<Response>;

/** Wraps a route handler so every failure answers JSON `{ error, fieldErrors? }` with the right status. */
export function route<C>(handler: Handler<C>): Handler<C> {
  return async (request, context) => {
    try {
      return await handler(request, context);
    } catch (error) {
      return errorResponse(error);
    }
  };
}

/** Reads a JSON body, answering 400 when it is missing or not JSON. */
export async function readJson(request: Request): Promise<unknown> {
  try {
    return await request.json();
  } catch {
    throw new HttpError(400, "The request body must be JSON.");
  }
}

export type JsonBytes = Uint8Array<ArrayBuffer>;

/** A value as UTF-8 JSON, ready to cache and send as it is. */
export function encodeJson(value: unknown): JsonBytes {
  return new TextEncoder().encode(JSON.stringify(value));
}

/** Sends JSON that was encoded earlier (see encodeJson), without serialising it again. */
export function jsonBytesResponse(bytes: JsonBytes, status = 200): NextResponse {
  return new NextResponse(bytes, { status, headers: { "content-type": "application/json" } });
}
