import "server-only";
import { listProjectClientRecipients, listStudioStaffRecipients, type Recipient } from "@/db/queries/decision-people";
import { clientChoseMessage, decisionWaitingMessage, variationMessage, type EmailContent, type VariationStage } from "@/lib/mail/messages";
import { afterResponse } from "@/lib/mail/after-response";
import { appUrl, sendMail } from "@/lib/mail/send";

type DecisionRef = { id: string; title: string; dueDate: string };
type ProjectRef = { id: string; name: string; studioId: string };

export const studioDecisionPath = (projectId: string, decisionId: string) => `/studio/projects/${projectId}/decisions/${decisionId}`;
export const clientDecisionPath = (decisionId: string) => `/client/decisions/${decisionId}`;

/**
 * The change is already committed when these run, so a mail server that is down must not turn a
 * saved approval into an error: the mail goes out after the answer, failures are logged, and the
 * person's screen still tells the truth.
 */
async function deliver(recipients: Recipient[], build: (r: Recipient) => EmailContent) {
  await afterResponse(async () => {
    for (const r of recipients) {
      try {
        await sendMail({ to: r.email, ...build(r) });
      } catch (error) {
        console.error(`could not e-mail ${r.email}:`, error);
      }
    }
  });
}

/** "A decision is waiting for you", to each of the project's clients. */
export async function notifyDecisionWaiting(project: ProjectRef, decision: DecisionRef) {
  const url = appUrl(clientDecisionPath(decision.id));
  await deliver(await listProjectClientRecipients(project.id), () =>
    decisionWaitingMessage({ url, projectName: project.name, decisionTitle: decision.title, dueDate: decision.dueDate }),
  );
}

/** The client chose or approved: to the project's designers. */
export async function notifyClientChose(
  project: ProjectRef,
  decision: DecisionRef,
  input: { clientName: string; optionLabel: string; approved: boolean },
) {
  const url = appUrl(studioDecisionPath(project.id, decision.id));
  await deliver(await listStudioStaffRecipients(project.studioId), () =>
    clientChoseMessage({ url, projectName: project.name, decisionTitle: decision.title, ...input }),
  );
}

/**
 * Variation steps go to whoever acts next: a request to the designers (or, when a designer asked,
 * to the clients as notice), a price to the clients, an approval to the designers.
 */
export async function notifyVariation(
  project: ProjectRef,
  decision: DecisionRef,
  variationId: string,
  stage: VariationStage,
  audience: "staff" | "clients",
) {
  const path =
    audience === "staff"
      ? `${studioDecisionPath(project.id, decision.id)}/variations/${variationId}`
      : `${clientDecisionPath(decision.id)}/variations/${variationId}`;
  const url = appUrl(path);
  const recipients = audience === "staff" ? await listStudioStaffRecipients(project.studioId) : await listProjectClientRecipients(project.id);
  await deliver(recipients, () => variationMessage({ url, projectName: project.name, decisionTitle: decision.title, stage }));
}
