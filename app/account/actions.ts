"use server";

import { revalidatePath } from "next/cache";
import { setPassword, updateProfile } from "@/db/queries/account";
import { failure, formValues, keptValues, type ActionResult } from "@/lib/actions/result";
import { requireApiUser } from "@/lib/auth/session";
import { passwordChangeSchema, profileSchema } from "@/lib/validation/account";

const PASSWORD_FIELDS = ["currentPassword", "newPassword", "repeatPassword"];

/** "Save details": the person's own name and phone. */
export async function saveProfileAction(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  const values = keptValues(form);
  try {
    const actor = await requireApiUser();
    const { name, phone } = formValues(form);
    await updateProfile(actor, profileSchema.parse({ name: name ?? "", phone: phone ?? "" }));
    revalidatePath("/", "layout");
    return { ok: true, data: undefined };
  } catch (error) {
    return failure(error, values);
  }
}

/** "Set password" / "Change password". Passwords are never sent back to the form. */
export async function setPasswordAction(_prev: ActionResult<"set" | "changed">, form: FormData): Promise<ActionResult<"set" | "changed">> {
  try {
    const actor = await requireApiUser();
    const { currentPassword, newPassword, repeatPassword } = formValues(form);
    const kind = await setPassword(actor, passwordChangeSchema.parse({ currentPassword: currentPassword || undefined, newPassword, repeatPassword }));
    revalidatePath("/account");
    return { ok: true, data: kind };
  } catch (error) {
    return failure(error, keptValues(form, PASSWORD_FIELDS));
  }
}
