import { eq } from "drizzle-orm";
import { db } from "@/db";
import { studios } from "@/db/schema";
import { isOwner } from "@/lib/auth/permissions";
import { readAccessStandard } from "@/lib/boards/check-settings";
import type { AccessStandard } from "@/lib/colour";
import { forbidden, notFound } from "@/lib/http";
import type { StudioRates } from "@/lib/pricing/option-price";
import type { StudioSettingsInput } from "@/lib/validation/studio-settings";
import { writeAudit } from "./audit";
import { repriceOpenOptions } from "./option-reprice";
import { writeTransaction } from "./serial-write";
import type { Actor } from "./users";

type Reader = Pick<typeof db, "select">;

export type StudioSettingsView = StudioRates & { studioId: string; studioName: string; accessStandard: AccessStandard; canChange: boolean };

/** The rates an option's price is built with; GST 10 % and no markup when a studio is not found. */
export async function getStudioRates(studioId: string, reader: Reader = db): Promise<StudioRates> {
  const [row] = await reader
    .select({ markupBasisPoints: studios.markupBasisPoints, taxBasisPoints: studios.taxBasisPoints })
    .from(studios)
    .where(eq(studios.id, studioId));
  return row ?? { markupBasisPoints: 0, taxBasisPoints: 1000 };
}

function staffStudio(actor: Actor) {
  if (!actor.studio) throw forbidden();
  return actor.studio;
}

/** The signed-in staff member's studio settings; only the owner may change them. */
export async function getStudioSettings(actor: Actor): Promise<StudioSettingsView> {
  const studio = staffStudio(actor);
  const [row] = await db.select().from(studios).where(eq(studios.id, studio.id));
  if (!row) throw notFound("That studio");
  return {
    studioId: row.id,
    studioName: row.name,
    markupBasisPoints: row.markupBasisPoints,
    taxBasisPoints: row.taxBasisPoints,
    accessStandard: readAccessStandard(row.accessStandard),
    canChange: isOwner(actor),
  };
}

/**
 * The owner sets the studio's markup and tax, its access standard, or both. When the rates change,
 * options whose price is built (not set by hand) on decisions not yet approved are worked out again
 * in the same transaction (option-reprice.ts); approved decisions never change. The access standard
 * is read by every board and decision check as it is drawn, so the next view follows it (the write
 * transaction makes cached board views stale).
 */
export async function updateStudioSettings(actor: Actor, input: StudioSettingsInput) {
  const studio = staffStudio(actor);
  if (!isOwner(actor)) throw forbidden();
  const rates: StudioRates | null =
    input.markupBasisPoints !== undefined && input.taxBasisPoints !== undefined
      ? { markupBasisPoints: input.markupBasisPoints, taxBasisPoints: input.taxBasisPoints }
      : null;
  return writeTransaction(async (tx) => {
    const [row] = await tx.select({ accessStandard: studios.accessStandard }).from(studios).where(eq(studios.id, studio.id));
    const before = { ...(await getStudioRates(studio.id, tx)), accessStandard: readAccessStandard(row?.accessStandard) };
    const after = { ...before, ...rates, ...(input.accessStandard ? { accessStandard: input.accessStandard } : {}) };
    await tx.update(studios).set(after).where(eq(studios.id, studio.id));
    const repriced = rates ? await repriceOpenOptions(tx, { studioId: studio.id, actorId: actor.userId, before, after: rates }) : { options: 0, decisions: 0 };
    await writeAudit(
      {
        studioId: studio.id,
        actorId: actor.userId,
        action: "studio.settings.changed",
        entityType: "studio",
        entityId: studio.id,
        detail: { before, after, repricedOptions: repriced.options, repricedDecisions: repriced.decisions },
      },
      tx,
    );
    return { ...after, repriced };
  });
}
