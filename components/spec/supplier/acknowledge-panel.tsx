"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { m } from "framer-motion";
import { MotionScope } from "@/components/motion-scope";
import { Badge, Button } from "@/components/ui";
import { formatShortDay } from "@/lib/spec/format";
import { postAcknowledgement, revisionKey } from "./api";

type Props = { revisionId: string; letter: string; acknowledgedAt: string | null; byName: string | null; replaced: boolean };

/**
 * Receipt first: a supplier confirms they have revision X before they record orders against it.
 * The confirmation settles into place (motion explains that the state changed; none if reduced).
 */
export function AcknowledgePanel({ revisionId, letter, acknowledgedAt, byName, replaced }: Props) {
  const queryClient = useQueryClient();
  const mutation = useMutation({
    mutationFn: () => postAcknowledgement(revisionId),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: revisionKey(revisionId) }),
  });
  if (acknowledgedAt) {
    return (
      // Animate only a fresh acknowledgement: a server-rendered one must be visible without scripts.
      <MotionScope>
        <m.div initial={mutation.isSuccess ? { opacity: 0, y: 6 } : false} animate={{ opacity: 1, y: 0 }} transition={{ duration: 0.25 }} className="flex flex-col items-start gap-1" role="status">
          <Badge tone="ok">You acknowledged revision {letter}</Badge>
          <p className="text-ink-soft">
            On {formatShortDay(acknowledgedAt.slice(0, 10))}
            {byName ? ` by ${byName}` : ""}.{replaced ? "" : " Record order dates on each line below."}
          </p>
        </m.div>
      </MotionScope>
    );
  }
  return (
    <div className="flex flex-col gap-3">
      <p className="text-lg font-medium">Please confirm you&apos;ve received revision {letter}.</p>
      <p className="text-ink-soft">It tells the designer you have these lines. You can then record when you order each one.</p>
      {mutation.error && (
        <p role="alert" className="rounded-md bg-problem-wash px-3 py-2 text-problem-ink">
          {mutation.error.message}
        </p>
      )}
      <Button type="button" size="lg" className="w-full sm:w-auto" pending={mutation.isPending} onClick={() => mutation.mutate()}>
        I&apos;ve received revision {letter}
      </Button>
    </div>
  );
}
