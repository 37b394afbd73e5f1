import { z } from "zod";
import type { OptionView } from "./types";

/**
 * Exactly what the approver was shown, frozen into the approval row: the option, each finish
 * with its code, colour and LRV, quantities, the price against the allowance and the checks.
 */
export function buildApprovalSnapshot(
  decision: { id: string; title: string; roomName: string; allowanceCents: number; version: number },
  option: OptionView,
) {
  return {
    kind: "approval",
    decision: { id: decision.id, title: decision.title, room: decision.roomName, version: decision.version },
    optionId: option.id,
    option: option.label,
    notes: option.notes,
    priceCents: option.priceCents,
    allowanceCents: decision.allowanceCents,
    differenceCents: option.comparison.differenceCents,
    lines: option.lines.map(snapshotLine),
    checks: { source: option.checks.source, checked: option.checks.checked, shown: option.checks.shown },
    cautions: option.cautionKeys,
  };
}

export function buildVariationSnapshot(input: {
  reason: string;
  from: OptionView | null;
  to: OptionView | null;
  priceDeltaCents: number;
  timeImpactDays: number;
}) {
  return {
    kind: "variation",
    reason: input.reason,
    fromOptionId: input.from?.id ?? null,
    fromOption: input.from?.label ?? null,
    optionId: input.to?.id ?? null,
    option: input.to?.label ?? null,
    priceDeltaCents: input.priceDeltaCents,
    priceIncludesGst: true,
    timeImpactDays: input.timeImpactDays,
    lines: input.to?.lines.map(snapshotLine) ?? [],
  };
}

function snapshotLine(l: OptionView["lines"][number]) {
  return {
    finishId: l.finishId,
    finish: l.finishName,
    code: l.productCode,
    colour: l.hex,
    lrv: l.lrv,
    lrvSource: l.lrvSource,
    quantity: l.quantity,
    unit: l.unit,
    location: l.location,
  };
}

/** Reads a stored snapshot loosely: older rows (and the demo's) carry fewer fields. */
const storedSnapshot = z.object({
  kind: z.string().optional(),
  option: z.string().nullish(),
  priceCents: z.number().optional(),
  allowanceCents: z.number().optional(),
  differenceCents: z.number().optional(),
  priceDeltaCents: z.number().optional(),
  timeImpactDays: z.number().optional(),
  reason: z.string().optional(),
  fromOption: z.string().nullish(),
  lines: z
    .array(
      z.object({
        finish: z.string(),
        code: z.string().nullish(),
        colour: z.string().nullish(),
        lrv: z.number().nullish(),
        quantity: z.number(),
        unit: z.string(),
      }),
    )
    .optional()
    .default([]),
  checks: z
    .object({ shown: z.array(z.object({ verdict: z.string(), between: z.string(), reason: z.string() })).default([]) })
    .optional(),
});
export type StoredSnapshot = z.infer<typeof storedSnapshot>;

export function readSnapshot(value: unknown): StoredSnapshot | null {
  const parsed = storedSnapshot.safeParse(value);
  return parsed.success ? parsed.data : null;
}
