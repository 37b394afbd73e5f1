"use server";

import { revalidatePath } from "next/cache";
import { addDesigner } from "@/db/queries/studios";
import { failure, formValues, keptValues, type ActionResult } from "@/lib/actions/result";
import { requireApiUser } from "@/lib/auth/session";
import { invitationMessage } from "@/lib/mail/messages";
import { appUrl, sendMail } from "@/lib/mail/send";
import { inviteDesignerSchema } from "@/lib/validation/auth";

/** Owners only: adds a designer and e-mails them a way in. */
export async function inviteDesignerAction(_prev: ActionResult, form: FormData): Promise<ActionResult> {
  try {
    const actor = await requireApiUser("owner");
    const input = inviteDesignerSchema.parse(formValues(form));
    const user = await addDesigner(actor.studio?.id ?? "", actor.userId, input);
    await sendMail({
      to: user.email,
      ...invitationMessage({
        url: appUrl(`/sign-in?email=${encodeURIComponent(user.email)}`),
        studioName: actor.studio?.name ?? "",
        inviterName: actor.name ?? actor.email,
        role: "designer",
      }),
    });
    revalidatePath("/studio/team");
    return { ok: true, data: undefined };
  } catch (error) {
    return failure(error, keptValues(form));
  }
}
