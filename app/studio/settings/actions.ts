"use server";

import { revalidatePath } from "next/cache";
import { updateStudioSettings } from "@/db/queries/studio-settings";
import { failure, formValues, keptValues, type ActionResult } from "@/lib/actions/result";
import { requireApiUser } from "@/lib/auth/session";
import { accessStandardFormSchema, isAccessStandardForm, studioSettingsFormSchema } from "@/lib/validation/studio-settings";

export type SettingsSaved = { repricedOptions: number; repricedDecisions: number };

/**
 * Owners only, from either form on the settings page (both work without JavaScript): the markup
 * and tax typed as percentages, or (with the hidden `section=access`) the access standard.
 */
export async function saveStudioSettingsAction(_prev: ActionResult<SettingsSaved>, form: FormData): Promise<ActionResult<SettingsSaved>> {
  try {
    const actor = await requireApiUser("owner");
    const values = formValues(form);
    const input = isAccessStandardForm(values) ? accessStandardFormSchema.parse(values) : studioSettingsFormSchema.parse(values);
    const { repriced } = await updateStudioSettings(actor, input);
    revalidatePath("/studio/settings");
    return { ok: true, data: { repricedOptions: repriced.options, repricedDecisions: repriced.decisions } };
  } catch (error) {
    return failure(error, keptValues(form));
  }
}
