import type { TeamEntry } from "@/db/queries/studio-invitations";
import { Badge } from "@/components/ui";
import { StaffControls } from "./staff-controls";
import { WithdrawTeamInvitation } from "./withdraw-team-invitation";

type Props = { team: TeamEntry[]; viewerId: string; owner: boolean };

/**
 * The studio's staff and the people invited onto it. Anyone not joined yet is shown the same way
 * (name, address, role, "Invited, not joined yet", and only "Withdraw invitation"), whether the
 * address was new or already had an account, so the list never tells which.
 */
export function TeamList({ team, viewerId, owner }: Props) {
  return (
    <ul className="divide-y divide-line">
      {team.map((p) => (
        <li key={p.id} className="flex flex-col gap-2 py-3">
          <div className="flex flex-wrap items-center justify-between gap-2">
            <span>
              {p.name} {p.name !== p.email ? <span className="text-ink-soft">· {p.email}</span> : null}
              {p.userId === viewerId ? <span className="text-ink-soft"> (you)</span> : null}
            </span>
            <span className="flex flex-wrap gap-2">
              <Badge tone="neutral">{p.role === "owner" ? "Owner" : "Designer"}</Badge>
              {p.joined ? null : <Badge tone="info">Invited, not joined yet</Badge>}
            </span>
          </div>
          {!owner || p.userId === viewerId ? null : p.joined && p.userId ? (
            <StaffControls person={{ userId: p.userId, name: p.name, role: p.role }} />
          ) : (
            <WithdrawTeamInvitation entryId={p.id} name={p.name} />
          )}
        </li>
      ))}
    </ul>
  );
}
