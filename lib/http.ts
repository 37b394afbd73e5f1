import { NextResponse } from "next/server";
import { ZodError } from "zod";
import { fieldErrorsOf, HttpError } from "@/lib/http-error";
import { allowedOrigins } from "@/lib/origins";
import { readBodyWithin } from "@/lib/request-body";
import { MAX_JSON_BYTES } from "@/lib/server/edge";

// Errors are safe to import anywhere (client components too); the rest of this file is server-side.
export * from "@/lib/http-error";

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

const READ_ONLY = new Set(["GET", "HEAD", "OPTIONS"]);

/**
 * A write must come from Mottle's own pages. Browsers send Origin on every cross-site request and
 * on same-origin POST, PUT, PATCH and DELETE (Fetch Standard §3.1, "Origin header"), and
 * Sec-Fetch-Site on every request (W3C Fetch Metadata). SameSite=Lax cookies alone do not stop a
 * page on another port or a sibling subdomain, which are "same-site". So: a foreign Origin, a
 * Sec-Fetch-Site other than same-origin, or neither header at all is refused before anything runs.
 */
export function assertSameOrigin(request: Request) {
  if (READ_ONLY.has(request.method)) return;
  const origin = request.headers.get("origin");
  const site = request.headers.get("sec-fetch-site");
  if (site !== null && site !== "same-origin") throw new HttpError(403, "This change must be made from Mottle's own pages.");
  if (origin !== null && !allowedOrigins.has(origin)) throw new HttpError(403, "This change must be made from Mottle's own pages.");
  if (origin === null && site === null) throw new HttpError(403, "This change must be made from Mottle's own pages (the request had no Origin).");
}

/**
 * Wraps a route handler: writes are checked for their origin first (assertSameOrigin), and every
 * failure answers JSON `{ error, fieldErrors? }` with the right status.
 */
export function route<C>(handler: Handler<C>): Handler<C> {
  return async (request, context) => {
    try {
      assertSameOrigin(request);
      return await handler(request, context);
    } catch (error) {
      return errorResponse(error);
    }
  };
}

export { MAX_JSON_BYTES };

/**
 * Reads a JSON body: 415 unless it is declared application/json (a text/plain body is what a
 * cross-site form or no-cors fetch can send), 413 past MAX_JSON_BYTES (read no further), 400 when
 * it is not JSON or any text in it holds a NUL character (SQLite would keep it, and readers stop
 * at it).
 */
export async function readJson(request: Request): Promise<unknown> {
  const type = (request.headers.get("content-type") ?? "").split(";")[0]?.trim().toLowerCase();
  if (type !== "application/json") throw new HttpError(415, "Send the request body as JSON (Content-Type: application/json).");
  const bytes = await readBodyWithin(request, MAX_JSON_BYTES, () => new HttpError(413, "That request is too large."));
  let value: unknown;
  try {
    value = JSON.parse(new TextDecoder("utf-8", { fatal: true }).decode(bytes));
  } catch {
    throw new HttpError(400, "The request body must be JSON.");
  }
  if (holdsNul(value)) throw new HttpError(400, "Text can't contain the NUL character (U+0000). Remove it and try again.");
  return value;
}

/** True when any string in a parsed JSON value (keys included) holds U+0000. */
export function holdsNul(value: unknown): boolean {
  if (typeof value === "string") return value.includes("\u0000");
  if (Array.isArray(value)) return value.some(holdsNul);
  if (value && typeof value === "object") return Object.entries(value).some(([key, item]) => key.includes("\u0000") || holdsNul(item));
  return false;
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
