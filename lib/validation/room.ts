import { z } from "zod";

export const roomName = z
  .string({ error: "Enter the room's name." })
  .trim()
  .min(1, "Enter the room's name.")
  .max(60, "Keep the room's name under 60 characters.");

export const addRoomSchema = z.object({ name: roomName }).strict();

/**
 * A change to one room: a new name, a new place in the project's list (`position`, 0 first; the
 * other rooms shift to make room), or both.
 */
export const editRoomSchema = z
  .object({
    name: roomName.optional(),
    position: z
      .number({ error: "Send the position as a whole number, 0 for the first room." })
      .int("Send the position as a whole number, 0 for the first room.")
      .min(0, "The first position is 0.")
      .max(999, "That position is past the end of the list.")
      .optional(),
  })
  .strict()
  .refine((v) => v.name !== undefined || v.position !== undefined, "Send a new name, a new position, or both.");
export type EditRoomInput = z.infer<typeof editRoomSchema>;
