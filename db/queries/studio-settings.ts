import { eq } from "drizzle-orm";
import { db } from "@/db";
import { studios } from "@/db/schema";
import { isOwner } from "@/lib/auth/permissions";
import { forbidden, notFound } from "@/lib/http";
import type { StudioRates } from "@/lib/pricing/option-price";
import type { StudioSettingsInput } from "@/lib/validation/studio-settings";
import { writeAudit } from "./audit";
import { repriceOpenOptions } from "./option-reprice";
import { writeTransaction } from "./serial-write";
import type { Actor } from "./users";

type Reader = Pick<typeof db, "select">;

export type StudioSettingsView = StudioRates & { studioId: string; studioName: string; canChange: boolean };

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
  return { studioId: row.id, studioName: row.name, markupBasisPoints: row.markupBasisPoints, taxBasisPoints: row.taxBasisPoints, canChange: isOwner(actor) };
}

/**
 * The owner sets the studio's markup and tax. In the same transaction, options whose price is
 * built (not set by hand) on decisions not yet approved are worked out again (option-reprice.ts);
 * approved decisions never change.
 */
export async function updateStudioSettings(actor: Actor, input: StudioSettingsInput) {
  const studio = staffStudio(actor);
  if (!isOwner(actor)) throw forbidden();
  return writeTransaction(async (tx) => {
    const before = await getStudioRates(studio.id, tx);
    await tx.update(studios).set({ markupBasisPoints: input.markupBasisPoints, taxBasisPoints: input.taxBasisPoints }).where(eq(studios.id, studio.id));
    const repriced = await repriceOpenOptions(tx, { studioId: studio.id, actorId: actor.userId, before, after: input });
    await writeAudit(
      {
        studioId: studio.id,
        actorId: actor.userId,
        action: "studio.settings.changed",
        entityType: "studio",
        entityId: studio.id,
        detail: { before, after: input, repricedOptions: repriced.options, repricedDecisions: repriced.decisions },
      },
      tx,
    );
    return { ...input, repriced };
  });
}
