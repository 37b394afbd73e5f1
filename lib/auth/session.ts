import "server-only";
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { cache } from "react";
import { getActor, type Actor } from "@/db/queries/users";
import { forbidden, unauthorised } from "@/lib/http";
import { sessionClaims } from "./index";
import { isOwner, isStaff } from "./permissions";
import { isSessionCurrent } from "./session-memo";

/**
 * The signed-in person, read once per request; null when signed out, and null when the session
 * was ended (sign-out, removal, a change of role) since its cookie was sealed.
 */
export const currentActor = cache(async (): Promise<Actor | null> => {
  const claims = await sessionClaims();
  if (!claims) return null;
  const actor = await getActor(claims.userId);
  return actor && isSessionCurrent(claims, actor) ? actor : null;
});

async function signInPath() {
  const path = (await headers()).get("x-mottle-path");
  return path ? `/sign-in?callbackUrl=${encodeURIComponent(path)}` : "/sign-in";
}

/** Pages: the signed-in person, or off to sign-in and back here afterwards. */
export async function requireUser(): Promise<Actor> {
  const actor = await currentActor();
  if (!actor) redirect(await signInPath());
  return actor;
}

export type Role = "owner" | "designer" | "client" | "supplier";

export function hasRole(actor: Actor, role: Role) {
  if (role === "owner") return isOwner(actor);
  if (role === "designer") return isStaff(actor);
  return actor.projects.some((p) => p.role === role);
}

/** Pages: signed in with one of these roles ("designer" includes the owner), else a 403 page. */
export async function requireRole(...roles: Role[]): Promise<Actor> {
  const actor = await requireUser();
  if (!roles.some((role) => hasRole(actor, role))) redirect("/forbidden");
  return actor;
}

/** Route handlers and server actions: throws 401/403 HttpErrors instead of redirecting. */
export async function requireApiUser(...roles: Role[]): Promise<Actor> {
  const actor = await currentActor();
  if (!actor) throw unauthorised();
  if (roles.length && !roles.some((role) => hasRole(actor, role))) throw forbidden();
  return actor;
}
