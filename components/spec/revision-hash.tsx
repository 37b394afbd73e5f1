import { Badge } from "@/components/ui";

/**
 * The revision's SHA-256, in full, broken into groups of eight so it can be read out over the
 * phone and compared with a printed copy. "Checks out" is worked out afresh on every view.
 */
export function RevisionHash({ sha256, verified }: { sha256: string; verified: boolean }) {
  const groups = sha256.match(/.{1,8}/g) ?? [sha256];
  return (
    <div className="flex flex-col gap-2">
      <p className="text-sm font-medium text-ink-soft">SHA-256 of the revision&apos;s content</p>
      <p className="break-all font-mono text-sm text-ink" data-hash={sha256}>
        {groups.map((g, i) => (
          <span key={i} className="mr-1.5 inline-block">
            {g}
          </span>
        ))}
      </p>
      {verified ? (
        <Badge tone="ok">Checks out: the stored content still has this hash</Badge>
      ) : (
        <Badge tone="problem">Does not check out: the stored content no longer matches this hash</Badge>
      )}
    </div>
  );
}
