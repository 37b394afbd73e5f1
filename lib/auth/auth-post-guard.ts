import "server-only";
import { addressWait } from "@/db/queries/passwords";
import { clientAddress } from "@/lib/client-address";
import { fieldErrorsOf, HttpError } from "@/lib/http";
import { email as emailSchema } from "@/lib/validation/auth";
import { callerOf } from "./caller";
import { allowSignInLink } from "./limits";
import { TooManyRequests, waitWords } from "./too-many";

const BASE_PATH = "/api/auth";

/** Auth.js's action and provider for a path, split as @auth/core splits it (lib/utils/web.js). */
export function authActionOf(pathname: string): { action?: string; providerId?: string } {
  if (!pathname.startsWith(BASE_PATH)) return {};
  const [action, providerId] = pathname.slice(BASE_PATH.length).split("/").filter(Boolean);
  return { action, providerId };
}

/** The body as Auth.js will read it (JSON or a URL-encoded form), from a copy of the request. */
async function bodyOf(request: Request): Promise<Record<string, unknown>> {
  const type = request.headers.get("content-type") ?? "";
  try {
    if (type.includes("application/json")) {
      const value: unknown = await request.clone().json();
      return value && typeof value === "object" ? (value as Record<string, unknown>) : {};
    }
    if (type.includes("application/x-www-form-urlencoded")) return Object.fromEntries(new URLSearchParams(await request.clone().text()));
  } catch {
    // Not readable: Auth.js will refuse it too.
  }
  return {};
}

/**
 * The limits for Auth.js's own POST endpoints, which anyone can call directly (with a CSRF token
 * from GET /api/auth/csrf) instead of going through the sign-in form's server actions:
 * asking for a sign-in link counts against the link limits (lib/auth/limits.ts), and a password
 * sign-in from an address over its limit is refused before any password is checked.
 * Throws TooManyRequests (429) or a 400 HttpError; returns when the request may go on.
 */
export async function guardAuthPost(request: Request): Promise<void> {
  const { action, providerId } = authActionOf(new URL(request.url).pathname);
  if (action === "signin" && providerId === "nodemailer") {
    const parsed = emailSchema.safeParse((await bodyOf(request)).email);
    if (!parsed.success) throw new HttpError(400, "Enter a valid e-mail address.", { email: fieldErrorsOf(parsed.error)._ ?? [] });
    await allowSignInLink(parsed.data, clientAddress(request.headers));
  }
  if (action === "callback" && providerId === "credentials") {
    const parsed = emailSchema.safeParse((await bodyOf(request)).email);
    const wait = await addressWait(callerOf(request.headers, parsed.success ? parsed.data : ""));
    if (wait > 0) throw new TooManyRequests(`Too many sign-in attempts from here. Wait ${waitWords(wait)}, or sign in with an e-mailed link.`, wait);
  }
}
