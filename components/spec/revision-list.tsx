import Link from "next/link";
import { Badge, Figure } from "@/components/ui";
import { formatDay } from "@/lib/format";

type Revision = { id: string; letter: string; issuedAt: Date; issuedBy: string; sha256: string; lineCount: number };

/** Issued revisions, newest first, each with the start of its hash to tell them apart at a glance. */
export function RevisionList({ revisions, hrefFor }: { revisions: Revision[]; hrefFor: (id: string) => string }) {
  return (
    <ul className="divide-y divide-line">
      {revisions.map((r, i) => (
        <li key={r.id} className="flex flex-col gap-1 py-3 sm:flex-row sm:items-center sm:justify-between sm:gap-4">
          <span className="flex flex-col">
            <Link href={hrefFor(r.id)} className="inline-flex min-h-tap items-center text-lg font-medium text-spruce underline-offset-4 hover:underline">
              Revision {r.letter}
            </Link>
            <span className="text-ink-soft">
              Issued {formatDay(r.issuedAt.toISOString().slice(0, 10))} by {r.issuedBy} · <Figure value={r.lineCount} /> {r.lineCount === 1 ? "line" : "lines"}
            </span>
          </span>
          <span className="flex items-center gap-3">
            <code className="font-mono text-sm text-ink-soft" title="Start of the SHA-256">
              {r.sha256.slice(0, 12)}…
            </code>
            {i === 0 ? <Badge tone="info">Latest</Badge> : <Badge>Replaced</Badge>}
          </span>
        </li>
      ))}
    </ul>
  );
}
