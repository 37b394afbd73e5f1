import { Badge } from "@/components/ui";
import type { DecisionStatus, VariationStatus } from "@/db/schema";

const decisionWords: Record<DecisionStatus, { tone: "caution" | "info" | "ok"; text: string }> = {
  open: { tone: "caution", text: "Waiting for the client" },
  chosen: { tone: "info", text: "Picked, not yet approved" },
  locked: { tone: "ok", text: "Approved and locked" },
};

export function DecisionStatusBadge({ status, forClient = false }: { status: DecisionStatus; forClient?: boolean }) {
  const w = decisionWords[status];
  return <Badge tone={w.tone}>{forClient && status === "open" ? "To choose" : w.text}</Badge>;
}

const variationWords: Record<VariationStatus, { tone: "caution" | "info" | "ok" | "neutral"; text: string }> = {
  requested: { tone: "caution", text: "Change asked for, to be priced" },
  priced: { tone: "info", text: "Priced, waiting for approval" },
  approved: { tone: "ok", text: "Change approved" },
  declined: { tone: "neutral", text: "Declined" },
  withdrawn: { tone: "neutral", text: "Withdrawn" },
};

export function VariationStatusBadge({ status }: { status: VariationStatus }) {
  const w = variationWords[status];
  return <Badge tone={w.tone}>{w.text}</Badge>;
}
