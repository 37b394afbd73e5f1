import { inviteToProjectAction, type InviteState } from "@/app/studio/projects/[projectId]/actions";
import { idle } from "@/lib/actions/result";
import { readCaughtMail } from "@/lib/mail/caught";

export const FERNLEAF_PROJECT = "demo-project-marrow";
export const NORTHWALL_PROJECT = "demo-project-quarry";

/** Posts the invite form as the browser would (every field a string, the project among them). */
export async function postInvite(fields: { projectId?: string; name?: string; email?: string; who?: string }, prev: InviteState = idle) {
  const form = new FormData();
  for (const [key, value] of Object.entries({ projectId: FERNLEAF_PROJECT, who: "client", ...fields })) {
    if (value !== undefined) form.set(key, value);
  }
  return inviteToProjectAction(prev, form);
}

/** What the studio is told, without the per-form counter (which only keys the form). */
export function answerShown(state: InviteState) {
  const { attempt: _attempt, values: _values, ...rest } = state as InviteState & { values?: unknown };
  return rest;
}

/** The caught e-mails to one address since `after`. */
export async function mailTo(address: string, after: Date) {
  const all = await readCaughtMail(process.env.MAIL_CATCHER_DIR ?? "", { to: address });
  return all.filter((m) => Date.parse(m.receivedAt) >= after.getTime() - 1000);
}
