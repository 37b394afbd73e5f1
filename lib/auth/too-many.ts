import { NextResponse } from "next/server";
import { HttpError } from "@/lib/http";

/**
 * A limit was reached: 429 with how long to wait. RFC 6585 §4 defines 429 Too Many Requests and
 * lets it carry Retry-After, whose delay-seconds form is RFC 9110 §10.2.3.
 */
export class TooManyRequests extends HttpError {
  constructor(
    message: string,
    readonly retryAfterSeconds: number,
  ) {
    super(429, message);
  }
}

/** "15 minutes", "1 minute", "40 seconds": how long to wait, in plain words. */
export function waitWords(seconds: number): string {
  if (seconds < 60) return `${seconds} second${seconds === 1 ? "" : "s"}`;
  const minutes = Math.ceil(seconds / 60);
  return `${minutes} minute${minutes === 1 ? "" : "s"}`;
}

/** The HTTP answer for a reached limit: JSON like every other error, plus Retry-After. */
export function tooManyResponse(error: TooManyRequests): NextResponse {
  return NextResponse.json(
    { error: error.message },
    { status: 429, headers: { "Retry-After": String(error.retryAfterSeconds), "Cache-Control": "no-store" } },
  );
}
