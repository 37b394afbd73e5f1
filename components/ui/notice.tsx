import type { ReactNode } from "react";
import { ToneIcon } from "./tone-icon";

export type NoticeTone = "info" | "caution" | "problem";

export type NoticeProps = {
  tone?: NoticeTone;
  title?: ReactNode;
  children: ReactNode;
};

// Calm by design: a pale panel with a rule on the left edge, no motion, no dismiss button,
// so safety notes ("Engineered stone contains crystalline silica…") are read, not swatted.
// `info` stays neutral grey: it is the everyday tone and should not pull the eye from finishes.
const tones: Record<NoticeTone, { box: string; icon: string; title: string }> = {
  info: { box: "border-stone-400 bg-stone-50 text-ink", icon: "text-info", title: "text-ink" },
  caution: { box: "border-caution bg-caution-wash text-ink", icon: "text-caution", title: "text-caution-ink" },
  problem: { box: "border-problem bg-problem-wash text-ink", icon: "text-problem", title: "text-problem-ink" },
};

export function Notice({ tone = "info", title, children }: NoticeProps) {
  const t = tones[tone];
  return (
    <div role="note" className={`flex gap-3 rounded-md border-l-4 px-4 py-3 ${t.box}`}>
      <ToneIcon tone={tone} className={`mt-0.5 size-[1.125rem] ${t.icon}`} />
      <div className="flex min-w-0 flex-col gap-1 text-base">
        {title && <p className={`font-semibold ${t.title}`}>{title}</p>}
        <div className="text-ink-soft [&_a]:text-ink [&_a]:underline">{children}</div>
      </div>
    </div>
  );
}
