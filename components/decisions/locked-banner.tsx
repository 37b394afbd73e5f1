"use client";

import { m, useReducedMotion } from "framer-motion";
import { MotionScope } from "@/components/motion-scope";
import { readLockFacts } from "@/lib/decisions/lock-facts";
import type { ApprovalView } from "@/lib/decisions/types";
import { When } from "./when";

/**
 * "Approved and locked", with who approved what the decision carries and when, read from the
 * approval records; after a variation, also who first approved what. Right after approving, the
 * padlock closes once so the person sees that the decision is now fixed; never under reduced motion.
 */
type Props = { approvals: readonly ApprovalView[]; carriedOptionId: string; optionLabel: string; justLocked: boolean; audience: "client" | "staff" };

export function LockedBanner(props: Props) {
  return (
    <MotionScope>
      <Banner {...props} />
    </MotionScope>
  );
}

function Banner({ approvals, carriedOptionId, optionLabel, justLocked, audience }: Props) {
  const reduce = useReducedMotion();
  const { carrying, first } = readLockFacts(approvals, carriedOptionId);
  const animate = justLocked && !reduce;
  return (
    <m.div
      role="status"
      initial={animate ? { opacity: 0, y: 8 } : false}
      animate={{ opacity: 1, y: 0 }}
      transition={{ duration: 0.3, ease: [0.2, 0, 0, 1] }}
      className="flex items-start gap-3 rounded-lg border border-ok/50 bg-ok-wash p-4 text-ink"
      data-testid="locked-banner"
    >
      <svg viewBox="0 0 24 24" width="28" height="28" aria-hidden="true" className="mt-0.5 shrink-0 text-ok-ink">
        <m.path
          d="M7 11V8a5 5 0 0 1 10 0v3"
          fill="none"
          stroke="currentColor"
          strokeWidth="2"
          strokeLinecap="round"
          initial={animate ? { y: -4 } : false}
          animate={{ y: 0 }}
          transition={{ delay: 0.25, duration: 0.25, ease: [0.2, 0, 0, 1] }}
        />
        <rect x="4.5" y="11" width="15" height="10" rx="2" fill="currentColor" />
      </svg>
      <div className="min-w-0">
        <p className="font-semibold text-ok-ink">Approved and locked: {optionLabel}</p>
        {carrying && (
          <p className="text-ink-soft" data-testid="locked-by">
            {carrying.variationId ? "Changed by a variation approved" : "Approved"} by {carrying.by.name} on <When iso={carrying.at} />.
          </p>
        )}
        {first && (
          <p className="text-ink-soft" data-testid="first-approved-by">
            First approved as “{first.optionLabel}” by {first.by.name} on <When iso={first.at} />.
          </p>
        )}
        <p className="text-ink-soft">
          {audience === "client"
            ? "Nobody can change it now. A change from here on is a variation, priced by your designer for you to approve."
            : "Nobody can edit it. A change goes through a variation: priced here, approved by the client."}
        </p>
      </div>
    </m.div>
  );
}
