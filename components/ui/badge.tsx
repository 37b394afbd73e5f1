import type { ReactNode } from "react";
import type { Tone } from "./tone-icon";
import { ToneIcon } from "./tone-icon";

export type BadgeTone = Tone;

export type BadgeProps = {
  tone?: BadgeTone;
  /** The words must name the state ("Approved", "Awaiting client"); colour only supports them. */
  children: ReactNode;
};

const tones: Record<BadgeTone, { box: string; icon: string }> = {
  neutral: { box: "border-line bg-stone-50 text-ink-soft", icon: "text-stone-600" },
  ok: { box: "border-ok/40 bg-ok-wash text-ok-ink", icon: "text-ok" },
  caution: { box: "border-caution/50 bg-caution-wash text-caution-ink", icon: "text-caution" },
  problem: { box: "border-problem/40 bg-problem-wash text-problem-ink", icon: "text-problem" },
  info: { box: "border-info/40 bg-info-wash text-info-ink", icon: "text-info" },
};

export function Badge({ tone = "neutral", children }: BadgeProps) {
  const t = tones[tone];
  return (
    <span
      className={`inline-flex max-w-full items-center gap-1.5 rounded-full border py-0.5 pl-1.5 pr-2.5 text-sm font-medium ${t.box}`}
    >
      <ToneIcon tone={tone} className={`size-3.5 ${t.icon}`} />
      <span className="min-w-0">{children}</span>
    </span>
  );
}
