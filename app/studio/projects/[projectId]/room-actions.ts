"use server";

import { revalidatePath } from "next/cache";
import { getProjectForStaff } from "@/db/queries/projects";
import { addRoom, getRoomForStaff, removeRoom, updateRoom } from "@/db/queries/rooms";
import { readFormId } from "@/lib/actions/form-ids";
import { failure, formValues, keptValues, type ActionResult } from "@/lib/actions/result";
import { requireApiUser } from "@/lib/auth/session";
import { HttpError } from "@/lib/http";
import { addRoomSchema, editRoomSchema } from "@/lib/validation/room";

/** "Add room": a new room at the end of the list. */
export async function addRoomAction(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  const values = keptValues(form);
  try {
    const actor = await requireApiUser("designer");
    const projectId = readFormId(form, "projectId", "That project");
    await getProjectForStaff(actor, projectId);
    await addRoom(actor, projectId, addRoomSchema.parse({ name: formValues(form).name ?? "" }).name);
    revalidatePath(`/studio/projects/${projectId}`);
    return { ok: true, data: undefined };
  } catch (error) {
    return failure(error, values);
  }
}

/**
 * One form per room; the button pressed says what to do (`intent`): "rename" (with `name`), "up",
 * "down" (one place, by `index`, the room's place in the list as shown) or "remove".
 */
export async function roomAction(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  const values = keptValues(form);
  try {
    const actor = await requireApiUser("designer");
    const projectId = readFormId(form, "projectId", "That project");
    const roomId = readFormId(form, "roomId", "That room");
    await getRoomForStaff(actor, projectId, roomId);
    const { intent, name, index } = formValues(form);
    if (intent === "remove") await removeRoom(actor, projectId, roomId);
    else if (intent === "rename") await updateRoom(actor, projectId, roomId, editRoomSchema.parse({ name: name ?? "" }));
    else if (intent === "up" || intent === "down") {
      const at = Number(index);
      if (!Number.isInteger(at)) throw new HttpError(400, "Reload the page and try again: the room's place in the list was missing.");
      await updateRoom(actor, projectId, roomId, editRoomSchema.parse({ position: Math.max(0, at + (intent === "up" ? -1 : 1)) }));
    } else throw new HttpError(400, "Choose Save name, Move up, Move down or Remove.");
    revalidatePath(`/studio/projects/${projectId}`);
    return { ok: true, data: undefined };
  } catch (error) {
    return failure(error, values);
  }
}
