"use server";

import { revalidatePath } from "next/cache";
import { updateStudioSettings } from "@/db/queries/studio-settings";
import { failure, formValues, keptValues, type ActionResult } from "@/lib/actions/result";
import { requireApiUser } from "@/lib/auth/session";
import { studioSettingsFormSchema } from "@/lib/validation/studio-settings";

export type SettingsSaved = { repricedOptions: number; repricedDecisions: number };

/** Owners only: the studio's markup and tax, typed as percentages (works without JavaScript). */
export async function saveStudioSettingsAction(_prev: ActionResult<SettingsSaved>, form: FormData): Promise<ActionResult<SettingsSaved>> {
  try {
    const actor = await requireApiUser("owner");
    const input = studioSettingsFormSchema.parse(formValues(form));
    const { repriced } = await updateStudioSettings(actor, input);
    revalidatePath("/studio/settings");
    return { ok: true, data: { repricedOptions: repriced.options, repricedDecisions: repriced.decisions } };
  } catch (error) {
    return failure(error, keptValues(form));
  }
}
