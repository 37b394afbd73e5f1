import type { DecisionView } from "@/lib/decisions/types";
import type { FieldErrors } from "@/lib/http";
import { centsToInput, parseMoney } from "@/lib/pricing/parse-amount";

/** What the designer's form holds: text as typed, turned into the API body on submit. */
export type LineDraft = { key: string; finishId: string; quantity: string; unit: string; item: string; location: string };
export type OptionDraft = {
  key: string;
  id?: string;
  label: string;
  /** false: the price is worked out from the lines; true: `price` is what the designer typed. */
  priceSetByHand: boolean;
  price: string;
  notes: string;
  boardId: string;
  lines: LineDraft[];
};
export type DecisionDraft = { room: string; title: string; allowance: string; dueDate: string; notify: boolean; options: OptionDraft[] };

const newKey = () => Math.random().toString(36).slice(2);

export const emptyLine = (): LineDraft => ({ key: newKey(), finishId: "", quantity: "1", unit: "", item: "", location: "" });
export const emptyOption = (): OptionDraft => ({ key: newKey(), label: "", priceSetByHand: false, price: "", notes: "", boardId: "", lines: [emptyLine()] });

export function emptyDraft(roomId: string): DecisionDraft {
  return { room: roomId, title: "", allowance: "", dueDate: "", notify: true, options: [emptyOption(), emptyOption()] };
}

export function draftFromView(view: DecisionView): DecisionDraft {
  return {
    room: view.roomId,
    title: view.title,
    allowance: centsToInput(view.allowanceCents),
    dueDate: view.dueDate,
    notify: false,
    options: view.options.map((o) => ({
      key: o.id,
      id: o.id,
      label: o.label,
      priceSetByHand: o.priceDetail?.overridden ?? true,
      price: centsToInput(o.priceCents),
      notes: o.notes ?? "",
      boardId: o.boardId ?? "",
      lines: o.lines.map((l) => ({ key: l.id, finishId: l.finishId, quantity: String(l.quantity), unit: l.unit, item: l.item ?? "", location: l.location ?? "" })),
    })),
  };
}

/** A quantity as typed → a number, or null (the server says what is wrong with it). */
export function readQuantity(text: string): number | null {
  return text.trim() === "" || Number.isNaN(Number(text)) ? null : Number(text);
}

/**
 * The API body, or the field errors of amounts that aren't amounts (everything else the server
 * checks). An option whose price is worked out sends no price: the server builds it from the lines.
 */
export function draftToBody(draft: DecisionDraft): { body: Record<string, unknown>; errors: FieldErrors } {
  const errors: FieldErrors = {};
  const allowance = parseMoney(draft.allowance);
  if (!allowance.ok) errors.allowanceCents = [allowance.message];
  const options = draft.options.map((o, i) => {
    let price: Record<string, unknown> = { priceOverridden: false };
    if (o.priceSetByHand) {
      const typed = parseMoney(o.price);
      if (!typed.ok) errors[`options.${i}.priceCents`] = [typed.message];
      price = { priceOverridden: true, priceCents: typed.ok ? typed.value : null };
    }
    return {
      ...(o.id ? { id: o.id } : {}),
      label: o.label,
      ...price,
      notes: o.notes || null,
      boardId: o.boardId || null,
      lines: o.lines.map((l) => ({ finishId: l.finishId, quantity: readQuantity(l.quantity), unit: l.unit, item: l.item || null, location: l.location || null })),
    };
  });
  return { body: { room: draft.room, title: draft.title, allowanceCents: allowance.ok ? allowance.value : null, dueDate: draft.dueDate, notify: draft.notify, options }, errors };
}
