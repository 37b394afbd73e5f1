import bcrypt from "bcryptjs";
import { eq } from "drizzle-orm";
import { db } from "@/db";
import { users } from "@/db/schema";
import { HttpError } from "@/lib/http";
import type { PasswordChangeInput, ProfileInput } from "@/lib/validation/account";
import { writeAudit } from "./audit";
import { writeTransaction, type Tx } from "./serial-write";
import { PASSWORD_COST } from "./studios";
import type { Actor } from "./users";

/**
 * A person's own change, in the audit log of every studio it concerns: their own studio's log
 * (with what changed, from → to), and each project they are on as a client or supplier's contact
 * (which fields only: those studios show them by the name they typed, never this one).
 */
async function auditAccount(tx: Tx, actor: Actor, action: string, own: Record<string, unknown>, others: Record<string, unknown>) {
  const base = { actorId: actor.userId, action, entityType: "user", entityId: actor.userId };
  if (actor.studio) await writeAudit({ ...base, studioId: actor.studio.id, detail: own }, tx);
  for (const p of actor.projects) await writeAudit({ ...base, studioId: p.studioId, projectId: p.projectId, detail: others }, tx);
}

export async function getAccount(userId: string) {
  const user = await db.query.users.findFirst({ where: eq(users.id, userId) });
  return user ? { name: user.name, email: user.email, phone: user.phone, hasPassword: user.passwordHash !== null } : null;
}

/** The person's own name and phone number. */
export async function updateProfile(actor: Actor, input: ProfileInput) {
  return writeTransaction(async (tx) => {
    const user = await tx.query.users.findFirst({ where: eq(users.id, actor.userId) });
    if (!user) throw new HttpError(401, "Sign in to continue.");
    const changes: Record<string, { from: string | null; to: string | null }> = {};
    if (input.name !== undefined && input.name !== user.name) changes.name = { from: user.name, to: input.name };
    if (input.phone !== undefined && input.phone !== user.phone) changes.phone = { from: user.phone, to: input.phone };
    if (Object.keys(changes).length === 0) return { name: user.name, phone: user.phone };
    const [updated] = await tx
      .update(users)
      .set(Object.fromEntries(Object.entries(changes).map(([k, c]) => [k, c.to])))
      .where(eq(users.id, user.id))
      .returning({ name: users.name, phone: users.phone });
    if (!updated) throw new Error("profile update returned nothing");
    await auditAccount(tx, actor, "account.updated", { changes }, { fields: Object.keys(changes) });
    return updated;
  });
}

/**
 * Sets a first password (someone who signed in by e-mailed link) or changes it; changing one
 * needs the current password. Hashed before the write turn, as at sign-up.
 */
export async function setPassword(actor: Actor, input: PasswordChangeInput): Promise<"set" | "changed"> {
  const user = await db.query.users.findFirst({ where: eq(users.id, actor.userId) });
  if (!user) throw new HttpError(401, "Sign in to continue.");
  if (user.passwordHash) {
    const current = input.currentPassword ?? "";
    const ok = current.length > 0 && (await bcrypt.compare(current, user.passwordHash));
    if (!ok) {
      const message = current ? "That isn't your current password." : "Enter your current password.";
      throw new HttpError(400, message, { currentPassword: [message] });
    }
  }
  const passwordHash = await bcrypt.hash(input.newPassword, PASSWORD_COST);
  const kind = user.passwordHash ? "changed" : "set";
  await writeTransaction(async (tx) => {
    await tx.update(users).set({ passwordHash }).where(eq(users.id, user.id));
    await auditAccount(tx, actor, `account.password_${kind}`, {}, {});
  });
  return kind;
}
