"use server";

import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { getSupplier } from "@/db/queries/suppliers";
import { createSupplier, deleteSupplier, updateSupplier } from "@/db/queries/supplier-writes";
import { readFormId, readOptionalFormId } from "@/lib/actions/form-ids";
import { failure, formValues, keptValues, type ActionResult } from "@/lib/actions/result";
import { requireApiUser } from "@/lib/auth/session";
import { HttpError } from "@/lib/http";
import { readSupplierForm } from "@/lib/validation/supplier";

// The forms post the supplier's id in a hidden input (a browser-side `.bind` hangs React's server
// renderer when a form is posted without JavaScript). Each action checks the role, then that the
// supplier is this studio's, then the body.
const listPath = "/studio/suppliers";
const supplierPath = (supplierId: string) => `${listPath}/${supplierId}`;

/** Adds (no supplierId) or changes (with one) a supplier and its contacts, then shows it. */
export async function saveSupplierAction(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  let target: string;
  try {
    const actor = await requireApiUser("designer");
    const supplierId = readOptionalFormId(form, "supplierId", "That supplier");
    if (supplierId) await getSupplier(actor, supplierId);
    const input = readSupplierForm(formValues(form));
    if (supplierId) {
      await updateSupplier(actor, supplierId, input);
      target = `${supplierPath(supplierId)}?saved=${Date.now()}`;
    } else {
      const created = await createSupplier(actor, input);
      target = `${supplierPath(created.id)}?added=1`;
    }
  } catch (error) {
    return failure(error, keptValues(form));
  }
  revalidatePath(listPath, "layout");
  redirect(target);
}

/** Archives (`archived=1`) or brings back (`archived=0`) a supplier. */
export async function archiveSupplierAction(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  let supplierId: string;
  try {
    const actor = await requireApiUser("designer");
    supplierId = readFormId(form, "supplierId", "That supplier");
    await updateSupplier(actor, supplierId, { archived: form.get("archived") === "1" });
  } catch (error) {
    return failure(error);
  }
  revalidatePath(listPath, "layout");
  redirect(`${supplierPath(supplierId)}?saved=${Date.now()}`);
}

/** Deletes a supplier nothing names, once the box is ticked; one in use is refused with the reason. */
export async function deleteSupplierAction(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  try {
    const actor = await requireApiUser("designer");
    const supplierId = readFormId(form, "supplierId", "That supplier");
    if (form.get("confirm") !== "yes") {
      await getSupplier(actor, supplierId);
      const message = "Tick the box to confirm you want to delete this supplier for good.";
      throw new HttpError(400, message, { confirm: [message] });
    }
    await deleteSupplier(actor, supplierId);
  } catch (error) {
    return failure(error);
  }
  revalidatePath(listPath, "layout");
  redirect(`${listPath}?deleted=1`);
}
