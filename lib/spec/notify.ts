import "server-only";
import { acknowledgeRevision } from "@/db/queries/spec-handoff";
import { issueRevision } from "@/db/queries/spec-issue";
import { readLineFinishDetails, readStudioContact } from "@/db/queries/spec-line-detail";
import type { Actor } from "@/db/queries/users";
import { revisionIssuedMessage, supplierAcknowledgedMessage } from "@/lib/mail/messages";
import { appUrl, sendMail } from "@/lib/mail/send";
import { describeSurfaceFormat, describeWhere, noFinishDetail } from "./line-detail";

/** A mail server being down must not undo a revision that is already issued: log it and carry on. */
async function trySend(to: string, message: { subject: string; text: string; html: string }): Promise<boolean> {
  try {
    await sendMail({ to, ...message });
    return true;
  } catch (error) {
    console.error(`could not send "${message.subject}" to ${to}`, error);
    return false;
  }
}

/** Issues the next revision, then e-mails each supplier's contacts a link to their lines in it. */
export async function issueRevisionAndNotify(actor: Actor, projectId: string) {
  const issued = await issueRevision(actor, projectId);
  const url = appUrl(`/supplier/revisions/${issued.revision.id}`);
  const [details, contact] = await Promise.all([
    readLineFinishDetails(issued.lines.map((l) => l.finishId)),
    readStudioContact(issued.project.studioId, actor.userId),
  ]);
  // Each supplier's e-mail lists their own lines only, with what they need to act on them.
  const linesFor = (supplierId: string) =>
    issued.lines
      .filter((l) => l.supplierId === supplierId)
      .map((l) => ({
        where: describeWhere(l),
        item: l.item,
        finishName: l.finishName,
        surfaceFormat: describeSurfaceFormat(details.get(l.finishId ?? "") ?? noFinishDetail),
        productCode: l.productCode,
        quantity: `${l.quantity} ${l.unit}`,
        orderByDate: l.orderByDate,
      }));
  const sends = issued.recipients.flatMap((r) =>
    r.emails.map(async (to) => ({
      supplierId: r.supplierId,
      to,
      sent: await trySend(
        to,
        revisionIssuedMessage({
          url,
          projectName: issued.project.name,
          letter: issued.revision.letter,
          supplierName: r.supplierName,
          lineCount: r.lineCount,
          siteAddress: issued.project.siteAddress,
          installDate: issued.project.installDate,
          contact,
          lines: linesFor(r.supplierId),
        }),
      ),
    })),
  );
  return { ...issued, notified: await Promise.all(sends) };
}

/** Records a supplier's acknowledgement and, the first time, tells the studio. */
export async function acknowledgeRevisionAndNotify(actor: Actor, revisionId: string) {
  const result = await acknowledgeRevision(actor, revisionId);
  if (result.created) {
    const url = appUrl(`/studio/projects/${result.project.id}/handoff`);
    const message = supplierAcknowledgedMessage({
      url,
      projectName: result.project.name,
      letter: result.revision.letter,
      supplierName: result.supplierName,
    });
    await Promise.all(result.designerEmails.map((to) => trySend(to, message)));
  }
  return result;
}
