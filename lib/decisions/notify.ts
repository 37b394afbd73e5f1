import "server-only";
import { listProjectClientRecipients, listStudioStaffRecipients, readNameOnProject, type Recipient } from "@/db/queries/decision-people";
import { clientChoseMessage, decisionWaitingMessage, variationMessage, type EmailContent, type VariationStage } from "@/lib/mail/messages";
import { afterResponse } from "@/lib/mail/after-response";
import { appUrl, sendMail } from "@/lib/mail/send";

type DecisionRef = { id: string; title: string; dueDate: string };
type ProjectRef = { id: string; name: string; studioId: string };

export const studioDecisionPath = (projectId: string, decisionId: string) => `/studio/projects/${projectId}/decisions/${decisionId}`;
export const clientDecisionPath = (decisionId: string) => `/client/decisions/${decisionId}`;

/** Who got the e-mail and who didn't (the mail server refused or was down; logged). */
export type Delivery = { delivered: string[]; failed: string[] };

/** Sends to each recipient now and reports what happened; one failure doesn't stop the rest. */
async function deliverNow(recipients: Recipient[], build: (r: Recipient) => EmailContent): Promise<Delivery> {
  const results = await Promise.all(
    recipients.map(async (r) => {
      try {
        await sendMail({ to: r.email, ...build(r) });
        return { email: r.email, ok: true };
      } catch (error) {
        console.error(`could not e-mail ${r.email}:`, error);
        return { email: r.email, ok: false };
      }
    }),
  );
  return { delivered: results.filter((r) => r.ok).map((r) => r.email), failed: results.filter((r) => !r.ok).map((r) => r.email) };
}

/**
 * Notices that follow a change already committed go out after the answer (nobody waits on the
 * mail server to see their choice saved); failures are logged, and the screen only ever says the
 * change was saved, never that an e-mail went.
 */
async function deliverLater(recipients: () => Promise<Recipient[]>, build: (r: Recipient) => EmailContent) {
  await afterResponse(async () => {
    await deliverNow(await recipients(), build);
  });
}

const waitingMessage = (project: ProjectRef, decision: DecisionRef) => {
  const url = appUrl(clientDecisionPath(decision.id));
  return () => decisionWaitingMessage({ url, projectName: project.name, decisionTitle: decision.title, dueDate: decision.dueDate });
};

/**
 * "Send to client": "a decision is waiting for you" to each of the project's clients. Sending *is*
 * what the designer asked for, so this waits for the mail server and says who was reached.
 */
export async function sendDecisionWaiting(project: ProjectRef, decision: DecisionRef): Promise<Delivery> {
  return deliverNow(await listProjectClientRecipients(project.id), waitingMessage(project, decision));
}

/** The same notice as a by-product of opening a decision: after the answer, like the others. */
export async function notifyDecisionWaiting(project: ProjectRef, decision: DecisionRef) {
  await deliverLater(() => listProjectClientRecipients(project.id), waitingMessage(project, decision));
}

/** The client chose or approved: to the project's designers, naming the client as this studio named them. */
export async function notifyClientChose(
  project: ProjectRef,
  decision: DecisionRef,
  input: { clientId: string; optionLabel: string; approved: boolean },
) {
  const url = appUrl(studioDecisionPath(project.id, decision.id));
  let clientName = "";
  await deliverLater(
    async () => {
      clientName = await readNameOnProject(project.id, input.clientId);
      return listStudioStaffRecipients(project.studioId);
    },
    () => clientChoseMessage({ url, projectName: project.name, decisionTitle: decision.title, clientName, optionLabel: input.optionLabel, approved: input.approved }),
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
  const recipients = () => (audience === "staff" ? listStudioStaffRecipients(project.studioId) : listProjectClientRecipients(project.id));
  await deliverLater(recipients, () => variationMessage({ url, projectName: project.name, decisionTitle: decision.title, stage }));
}
