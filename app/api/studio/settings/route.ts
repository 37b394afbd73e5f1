import { NextResponse } from "next/server";
import { getStudioSettings, updateStudioSettings } from "@/db/queries/studio-settings";
import { requireApiUser } from "@/lib/auth/session";
import { readJson, route } from "@/lib/http";
import { studioSettingsSchema } from "@/lib/validation/studio-settings";

/** The studio's markup on cost and tax on the client's price (basis points) and its access standard; every staff member may read them. */
export const GET = route(async () => {
  const actor = await requireApiUser("designer");
  return NextResponse.json(await getStudioSettings(actor));
});

/**
 * The owner changes both rates (`{ markupBasisPoints, taxBasisPoints }`), the access standard the
 * low-vision checks follow (`{ accessStandard: "as1428" | "bs8300" | "both" }`), or all three.
 * Built option prices on decisions not yet approved follow a rate change; the answer says how many moved.
 */
export const PATCH = route(async (request) => {
  const actor = await requireApiUser("owner");
  const input = studioSettingsSchema.parse(await readJson(request));
  const { repriced } = await updateStudioSettings(actor, input);
  return NextResponse.json({ ...(await getStudioSettings(actor)), repriced });
});
