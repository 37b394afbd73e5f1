import { formatEmailDate, renderEmail, toOneLine } from "./layout";
import type { EmailContent } from "./layout";

export type { EmailContent } from "./layout";
export { revisionIssuedMessage, type IssuedLineSummary } from "./revision-issued-message";

export type InvitationRole = "designer" | "client" | "supplier";
export type VariationStage = "requested" | "priced" | "approved";

export function signInLinkMessage({ url, host }: { url: string; host: string }): EmailContent {
  return renderEmail({
    subject: "Your sign-in link for Mottle",
    heading: "Sign in to Mottle",
    paragraphs: [`Use the button below to sign in to Mottle at ${host}. The link is valid for 24 hours.`],
    action: { label: "Sign in", url },
    footnote: "If you didn’t ask for this link, you can ignore this e-mail. Nobody can sign in without it.",
  });
}

const INVITATION_PURPOSE: Record<InvitationRole, (place: string) => string> = {
  designer: (place) => `to design with them on ${place}`,
  client: (place) => `to review finishes and make decisions on ${place}`,
  supplier: (place) => `to receive schedules and revisions for ${place}`,
};

export function invitationMessage(input: {
  url: string;
  studioName: string;
  inviterName: string;
  role: InvitationRole;
  projectName?: string;
}): EmailContent {
  const place = input.projectName ?? input.studioName;
  return renderEmail({
    subject: `${toOneLine(input.inviterName)} invited you to ${toOneLine(place)} on Mottle`,
    heading: `You’re invited to ${place}`,
    paragraphs: [
      `${input.inviterName} at ${input.studioName} has invited you as a ${input.role} ${INVITATION_PURPOSE[input.role](place)}.`,
    ],
    action: { label: "Accept the invitation", url: input.url },
    footnote: "If you weren’t expecting this invitation, you can ignore this e-mail.",
  });
}

/**
 * To someone who already has an account: a studio asks them onto a project, and nothing happens
 * until they sign in and accept. Says nothing about their other projects or studios.
 */
export function projectInvitationMessage(input: {
  url: string;
  studioName: string;
  inviterName: string;
  role: "client" | "supplier";
  projectName: string;
}): EmailContent {
  return renderEmail({
    subject: `${toOneLine(input.studioName)} invited you to ${toOneLine(input.projectName)} on Mottle`,
    heading: `You’re invited to ${input.projectName}`,
    paragraphs: [
      `${input.inviterName} at ${input.studioName} has invited you as a ${input.role} ${INVITATION_PURPOSE[input.role](input.projectName)}.`,
      "Sign in to Mottle with this e-mail address to accept or decline. You won’t be added until you accept.",
    ],
    action: { label: "Sign in to answer", url: input.url },
    footnote: "If you weren’t expecting this invitation, you can ignore this e-mail or decline it after signing in.",
  });
}

export function decisionWaitingMessage(input: {
  url: string;
  projectName: string;
  decisionTitle: string;
  dueDate: Date | string;
}): EmailContent {
  const due = formatEmailDate(input.dueDate);
  return renderEmail({
    subject: `A decision is waiting for you: ${toOneLine(input.decisionTitle)}`,
    heading: `${input.decisionTitle} is ready for your choice`,
    paragraphs: [
      `The options for ${input.decisionTitle} on ${input.projectName} are ready to look through.`,
      `Please choose by ${due} so the project can keep moving.`,
    ],
    action: { label: "Review the options", url: input.url },
  });
}

export function clientChoseMessage(input: {
  url: string;
  projectName: string;
  decisionTitle: string;
  clientName: string;
  optionLabel: string;
  approved: boolean;
}): EmailContent {
  const verb = input.approved ? "approved" : "chose";
  return renderEmail({
    subject: `${toOneLine(input.clientName)} ${verb} ${toOneLine(input.optionLabel)} for ${toOneLine(input.decisionTitle)}`,
    heading: `${input.clientName} ${verb} ${input.optionLabel}`,
    paragraphs: [
      input.approved
        ? `${input.clientName} chose ${input.optionLabel} for ${input.decisionTitle} on ${input.projectName} and approved it.`
        : `${input.clientName} chose ${input.optionLabel} for ${input.decisionTitle} on ${input.projectName}. It isn’t approved yet.`,
    ],
    action: { label: "Open the decision", url: input.url },
  });
}

export function supplierAcknowledgedMessage(input: {
  url: string;
  projectName: string;
  letter: string;
  supplierName: string;
}): EmailContent {
  return renderEmail({
    subject: `${toOneLine(input.supplierName)} acknowledged revision ${toOneLine(input.letter)}`,
    heading: `${input.supplierName} acknowledged revision ${input.letter}`,
    paragraphs: [`${input.supplierName} has acknowledged revision ${input.letter} for ${input.projectName}.`],
    action: { label: `View revision ${input.letter}`, url: input.url },
  });
}

const VARIATION_COPY: Record<VariationStage, { subject: string; sentence: string }> = {
  requested: { subject: "Variation requested", sentence: "A variation has been requested" },
  priced: { subject: "Variation priced", sentence: "The variation has been priced and is ready to review" },
  approved: { subject: "Variation approved", sentence: "The variation has been approved" },
};

export function variationMessage(input: {
  url: string;
  projectName: string;
  decisionTitle: string;
  stage: VariationStage;
}): EmailContent {
  const copy = VARIATION_COPY[input.stage];
  return renderEmail({
    subject: `${copy.subject}: ${toOneLine(input.decisionTitle)}`,
    heading: `${copy.subject}: ${input.decisionTitle}`,
    paragraphs: [`${copy.sentence} for ${input.decisionTitle} on ${input.projectName}.`],
    action: { label: "Open the variation", url: input.url },
  });
}

/**
 * To an address that already has a Mottle account: a studio asks them onto its team, and nothing
 * happens until they sign in and accept. Says nothing about their other studios or projects.
 */
export function studioInvitationMessage(input: { url: string; studioName: string; inviterName: string }): EmailContent {
  return renderEmail({
    subject: `${toOneLine(input.studioName)} invited you to their team on Mottle`,
    heading: `You’re invited to join ${input.studioName}`,
    paragraphs: [
      `${input.inviterName} at ${input.studioName} has invited you as a designer ${INVITATION_PURPOSE.designer(input.studioName)}.`,
      "Sign in to Mottle with this e-mail address to accept or decline. You won’t join their team until you accept.",
    ],
    action: { label: "Sign in to answer", url: input.url },
    footnote: "If you weren’t expecting this invitation, you can ignore this e-mail or decline it after signing in.",
  });
}
