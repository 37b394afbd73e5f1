import type { ReactNode } from "react";
import { Card, Figure, Notice } from "@/components/ui";
import { formatDay } from "@/lib/format";
import type { SpecDiff } from "@/lib/spec/diff";
import { DiffList } from "./diff-list";

type Props = {
  lineCount: number;
  pendingCount: number;
  lateCount: number;
  installDate: string | null;
  latest: { letter: string; issuedAt: Date } | null;
  changes: SpecDiff | null;
  issue: ReactNode;
};

function Count({ value, label, tone }: { value: number; label: string; tone?: "problem" | "caution" }) {
  const colour = tone === "problem" ? "text-problem-ink" : tone === "caution" ? "text-caution-ink" : "text-ink";
  return (
    <div className="flex flex-col">
      <Figure value={value} className={`text-3xl font-semibold ${colour}`} />
      <span className="text-ink-soft">{label}</span>
    </div>
  );
}

/** Where the specification stands: how many lines, what is open or late, and what an issue would change. */
export function SpecOverview({ lineCount, pendingCount, lateCount, installDate, latest, changes, issue }: Props) {
  return (
    <div className="grid items-start gap-6 lg:grid-cols-[1fr_1.4fr]">
      <Card title="At a glance">
        <div className="grid grid-cols-3 gap-4">
          <Count value={lineCount} label={lineCount === 1 ? "line" : "lines"} />
          <Count value={pendingCount} label="waiting for the client" tone={pendingCount ? "caution" : undefined} />
          <Count value={lateCount} label="late" tone={lateCount ? "problem" : undefined} />
        </div>
        <p className="mt-4 text-ink-soft">
          {installDate ? `Install ${formatDay(installDate)}: order-by dates count back from it by each finish's lead time.` : "Set the install date under Edit project, on the project's page, to work out order-by dates."}
        </p>
        {lateCount > 0 && (
          <div className="mt-4">
            <Notice tone="problem" title="Some lines are late">
              Their order-by date has passed without an order, or they are expected after the install date. They are marked in the schedule below.
            </Notice>
          </div>
        )}
      </Card>
      <Card title={latest ? `Since revision ${latest.letter}` : "Not issued yet"} actions={issue}>
        {latest && changes ? (
          <>
            <p className="mb-2 text-ink-soft">Revision {latest.letter} was issued {formatDay(latest.issuedAt.toISOString().slice(0, 10))}. What the next revision would change:</p>
            <DiffList diff={changes} empty={`The specification matches revision ${latest.letter}.`} />
          </>
        ) : (
          <p className="text-ink-soft">No revision has been issued. Issuing freezes these lines as revision A and e-mails each supplier their part.</p>
        )}
      </Card>
    </div>
  );
}
