import type { PendingInvitation } from "@/db/queries/invitations";
import { Card, Notice } from "@/components/ui";
import { formatDay } from "@/lib/format";
import { AnswerInvitationForm } from "./answer-invitation-form";

const roleWords = (i: PendingInvitation) => (i.role === "supplier" ? `a contact for ${i.supplierName ?? "a supplier"}` : "a client");

/** Invitations to projects waiting for this person's answer; nothing shows when there are none. */
export function PendingInvitations({ invitations }: { invitations: PendingInvitation[] }) {
  if (invitations.length === 0) return null;
  return (
    <Card title={invitations.length === 1 ? "An invitation for you" : `Invitations for you (${invitations.length})`}>
      <ul className="divide-y divide-line">
        {invitations.map((i) => {
          const label = `${i.projectName} from ${i.studioName}`;
          return (
            <li key={i.id} className="space-y-3 py-4 first:pt-0 last:pb-0">
              <div>
                <p className="text-lg font-medium">{i.projectName}</p>
                <p className="text-ink-soft">
                  {i.studioName} invited you as {roleWords(i)} on {formatDay(i.invitedAt.toISOString().slice(0, 10))}.
                </p>
              </div>
              {i.blocked ? <Notice tone="caution">{i.blocked}</Notice> : null}
              <AnswerInvitationForm invitationId={i.id} canAccept={!i.blocked} label={label} />
            </li>
          );
        })}
      </ul>
    </Card>
  );
}
