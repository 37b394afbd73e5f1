import type { Actor } from "@/db/queries/users";

/**
 * The permission table of PRODUCT.md, as functions of the signed-in person. Queries use these
 * to scope what they read; pages, actions and route handlers use them to refuse early.
 */
export const isStaff = (actor: Actor) => actor.studio !== null;
export const isOwner = (actor: Actor) => actor.studio?.role === "owner";

export function isStaffOfStudio(actor: Actor, studioId: string) {
  return actor.studio?.id === studioId;
}

export function projectRole(actor: Actor, projectId: string, studioId: string): "staff" | "client" | "supplier" | null {
  if (isStaffOfStudio(actor, studioId)) return "staff";
  const membership = actor.projects.find((p) => p.projectId === projectId);
  return membership?.role ?? null;
}

export function supplierIdFor(actor: Actor, projectId: string): string | null {
  return actor.projects.find((p) => p.projectId === projectId && p.role === "supplier")?.supplierId ?? null;
}

export function clientProjectIds(actor: Actor) {
  return actor.projects.filter((p) => p.role === "client").map((p) => p.projectId);
}
