import type { NextRequest } from "next/server";
import { handlers } from "@/lib/auth";
import { guardAuthPost } from "@/lib/auth/auth-post-guard";
import { TooManyRequests, tooManyResponse } from "@/lib/auth/too-many";
import { route } from "@/lib/http";

// Next hands route handlers a NextRequest; route() types the parameter as the Request it extends.
export const GET = route(async (request: Request) => handlers.GET(request as NextRequest));

/** Auth.js's POST endpoints, behind the same sign-in and link limits as the forms (lib/auth/auth-post-guard.ts). */
export const POST = route(async (request: Request) => {
  try {
    await guardAuthPost(request);
  } catch (error) {
    if (error instanceof TooManyRequests) return tooManyResponse(error);
    throw error;
  }
  return handlers.POST(request as NextRequest);
});
