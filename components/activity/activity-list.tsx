import Link from "next/link";
import { When } from "@/components/decisions/when";
import { describeAudit } from "@/lib/decisions/audit-words";

export type ActivityItem = {
  key: string;
  actorName: string | null;
  action: string;
  detail: Record<string, unknown> | null;
  parts: { action: string; detail: Record<string, unknown> | null }[];
  at: string;
  firstAt: string;
};

type Props = { entries: ActivityItem[]; page: number; pageCount: number; hrefFor: (page: number) => string };

/** The log, newest first; a run of board edits shows when it began and ended. */
export function ActivityList({ entries, page, pageCount, hrefFor }: Props) {
  return (
    <div className="space-y-4">
      <ol className="divide-y divide-line rounded-lg border border-line bg-card" data-testid="activity-log">
        {entries.map((e) => (
          <li key={e.key} className="flex flex-col gap-1 px-4 py-3 sm:flex-row sm:items-baseline sm:justify-between sm:gap-6" data-action={e.action}>
            <p>
              <span className="font-medium">{e.actorName ?? "Mottle"}</span> {describeAudit(e.action, e.detail, e.parts)}
            </p>
            <p className="shrink-0 text-sm text-ink-soft">
              {e.firstAt !== e.at ? (
                <>
                  <When iso={e.firstAt} /> to <When iso={e.at} />
                </>
              ) : (
                <When iso={e.at} />
              )}
            </p>
          </li>
        ))}
      </ol>
      {pageCount > 1 && (
        <nav aria-label="Pages of the activity log" className="flex flex-wrap items-center justify-between gap-3">
          {page > 1 ? (
            <Link href={hrefFor(page - 1)} className="inline-flex min-h-tap items-center font-medium text-spruce underline underline-offset-4">
              Newer entries
            </Link>
          ) : (
            <span />
          )}
          <span className="figures text-sm text-ink-soft">
            Page {page} of {pageCount}
          </span>
          {page < pageCount ? (
            <Link href={hrefFor(page + 1)} className="inline-flex min-h-tap items-center font-medium text-spruce underline underline-offset-4">
              Older entries
            </Link>
          ) : (
            <span />
          )}
        </nav>
      )}
    </div>
  );
}
