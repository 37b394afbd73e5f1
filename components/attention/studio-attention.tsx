import Link from "next/link";
import type { StudioAttention } from "@/db/queries/attention";
import { Badge, type BadgeTone } from "@/components/ui";
import { describeDue, formatDay } from "@/lib/format";

type Item = { key: string; href: string; title: string; detail: string; badge: { tone: BadgeTone; text: string } };

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** Every waiting thing as one row: what it is, which project, and a link to where it is dealt with. */
export function attentionItems(a: StudioAttention, today: string): Item[] {
  const project = (id: string) => `/studio/projects/${id}`;
  return [
    ...a.late.map((l) => ({
      key: `late-${l.id}`,
      href: `${project(l.projectId)}/handoff`,
      title: `${l.item} is late with ${l.supplierName ?? "its supplier"}`,
      detail: `${l.room} · ${l.projectName} · revision ${l.letter}`,
      badge:
        l.kind === "order-overdue"
          ? { tone: "problem" as const, text: `Not ordered, order by ${formatDay(l.orderByDate)}` }
          : { tone: "problem" as const, text: `Arrives ${formatDay(l.expectedOn)}, after the install` },
    })),
    ...a.due.map((d) => ({
      key: `due-${d.id}`,
      href: `${project(d.projectId)}/decisions/${d.id}`,
      title: `${d.title}: ${d.status === "chosen" ? "chosen, waiting for approval" : "waiting for the client's choice"}`,
      detail: `${d.roomName} · ${d.projectName}`,
      badge: { tone: d.dueDate < today ? ("problem" as const) : ("caution" as const), text: `${describeDue(d.dueDate, today)} (${formatDay(d.dueDate)})` },
    })),
    ...a.toPrice.map((v) => ({
      key: `price-${v.id}`,
      href: `${project(v.projectId)}/decisions/${v.decisionId}/variations/${v.id}`,
      title: `Price the variation to ${v.title}`,
      detail: `${v.projectName} · “${v.reason}”`,
      badge: { tone: "caution" as const, text: "Variation to price" },
    })),
    ...a.needsRevision.map((s) => ({
      key: `revision-${s.projectId}`,
      href: `${project(s.projectId)}/specification`,
      title: s.lastLetter ? `The specification changed since revision ${s.lastLetter}` : "The specification is ready for its first revision",
      detail: s.projectName,
      badge: { tone: "caution" as const, text: "Issue a new revision" },
    })),
    ...a.unacknowledged.map((u) => ({
      key: `ack-${u.revisionId}-${u.supplierId}`,
      href: `${project(u.projectId)}/handoff`,
      title: `${u.supplierName} hasn't acknowledged revision ${u.letter}`,
      detail: `${u.projectName} · ${plural(u.lineCount, "line", "lines")}`,
      badge: { tone: "info" as const, text: "Not acknowledged" },
    })),
  ];
}

export function StudioAttentionList({ attention, today }: { attention: StudioAttention; today: string }) {
  const items = attentionItems(attention, today);
  if (items.length === 0) {
    return (
      <p className="text-ink-soft">
        Nothing is waiting on you. Decisions due within two weeks, variations to price, specifications to issue, revisions not acknowledged and late
        orders will show here.
      </p>
    );
  }
  return (
    <ul className="divide-y divide-line" aria-label="Waiting on the studio">
      {items.map((item) => (
        <li key={item.key} className="flex flex-wrap items-center justify-between gap-2 py-3">
          <span className="min-w-0">
            <Link className="inline-flex min-h-tap items-center font-medium underline-offset-4 hover:underline" href={item.href}>
              {item.title}
            </Link>
            <span className="block text-ink-soft">{item.detail}</span>
          </span>
          <Badge tone={item.badge.tone}>{item.badge.text}</Badge>
        </li>
      ))}
    </ul>
  );
}
