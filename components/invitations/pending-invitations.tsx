import type { PendingInvitation } from "@/db/queries/invitations";
import type { PendingStudioInvitation } from "@/db/queries/studio-invitations";
import { Card, Notice } from "@/components/ui";
import { formatDay } from "@/lib/format";
import { AnswerInvitationForm } from "./answer-invitation-form";

const roleWords = (i: PendingInvitation) => (i.role === "supplier" ? `a contact for ${i.supplierName ?? "a supplier"}` : "a client");
const dayOf = (d: Date) => formatDay(d.toISOString().slice(0, 10));

type Props = { invitations: PendingInvitation[]; studioInvitations?: PendingStudioInvitation[] };

/**
 * Invitations waiting for this person's answer: to projects, and to studios' teams. Nothing shows
 * when there are none. A reason why one can only be declined is shown to this person alone.
 */
export function PendingInvitations({ invitations, studioInvitations = [] }: Props) {
  const total = invitations.length + studioInvitations.length;
  if (total === 0) return null;
  return (
    <Card title={total === 1 ? "An invitation for you" : `Invitations for you (${total})`}>
      <ul className="divide-y divide-line">
        {studioInvitations.map((i) => (
          <li key={i.id} className="space-y-3 py-4 first:pt-0 last:pb-0">
            <div>
              <p className="text-lg font-medium">{i.studioName}</p>
              <p className="text-ink-soft">
                {i.studioName} invited you to join their team as {i.role === "owner" ? "an owner" : "a designer"} on {dayOf(i.invitedAt)}.
              </p>
            </div>
            {i.blocked ? <Notice tone="caution">{i.blocked}</Notice> : null}
            <AnswerInvitationForm kind="studio" invitationId={i.id} canAccept={!i.blocked} label={`the team at ${i.studioName}`} />
          </li>
        ))}
        {invitations.map((i) => (
          <li key={i.id} className="space-y-3 py-4 first:pt-0 last:pb-0">
            <div>
              <p className="text-lg font-medium">{i.projectName}</p>
              <p className="text-ink-soft">
                {i.studioName} invited you as {roleWords(i)} on {dayOf(i.invitedAt)}.
              </p>
            </div>
            {i.blocked ? <Notice tone="caution">{i.blocked}</Notice> : null}
            <AnswerInvitationForm invitationId={i.id} canAccept={!i.blocked} label={`${i.projectName} from ${i.studioName}`} />
          </li>
        ))}
      </ul>
    </Card>
  );
}
