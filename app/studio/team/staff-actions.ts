"use server";

import { revalidatePath } from "next/cache";
import { assertStaffOfMyStudio, changeStaffRole, removeStaff } from "@/db/queries/staff";
import { readFormId } from "@/lib/actions/form-ids";
import { failure, formValues, type ActionResult } from "@/lib/actions/result";
import { requireApiUser } from "@/lib/auth/session";
import { staffRoleSchema } from "@/lib/validation/member";

/** Owners only: "Make owner" / "Make designer". The person's id comes in a hidden input. */
export async function changeStaffRoleAction(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  try {
    const actor = await requireApiUser("owner");
    const userId = readFormId(form, "userId", "That person");
    await assertStaffOfMyStudio(actor, userId);
    const input = staffRoleSchema.parse({ role: formValues(form).role });
    await changeStaffRole(actor, userId, input.role);
    revalidatePath("/studio/team");
    return { ok: true, data: undefined };
  } catch (error) {
    return failure(error);
  }
}

/** Owners only: takes a person off the studio's staff; never the last owner. */
export async function removeStaffAction(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  try {
    const actor = await requireApiUser("owner");
    const userId = readFormId(form, "userId", "That person");
    await removeStaff(actor, userId);
    revalidatePath("/studio/team");
    return { ok: true, data: undefined };
  } catch (error) {
    return failure(error);
  }
}
