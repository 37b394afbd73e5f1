import { centsToInput, parseMoneyToCents } from "@/lib/decisions/money-input";
import type { DecisionView } from "@/lib/decisions/types";
import type { FieldErrors } from "@/lib/http";

/** What the designer's form holds: text as typed, turned into the API body on submit. */
export type LineDraft = { key: string; finishId: string; quantity: string; unit: string; location: string };
export type OptionDraft = { key: string; id?: string; label: string; price: string; notes: string; boardId: string; lines: LineDraft[] };
export type DecisionDraft = { room: string; title: string; allowance: string; dueDate: string; notify: boolean; options: OptionDraft[] };

const newKey = () => Math.random().toString(36).slice(2);

export const emptyLine = (): LineDraft => ({ key: newKey(), finishId: "", quantity: "1", unit: "", location: "" });
export const emptyOption = (): OptionDraft => ({ key: newKey(), label: "", price: "", notes: "", boardId: "", lines: [emptyLine()] });

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
      price: centsToInput(o.priceCents),
      notes: o.notes ?? "",
      boardId: o.boardId ?? "",
      lines: o.lines.map((l) => ({ key: l.id, finishId: l.finishId, quantity: String(l.quantity), unit: l.unit, location: l.location ?? "" })),
    })),
  };
}

const MONEY_HINT = "Enter an amount in dollars, like 1500 or 1,500.00.";

/** The API body, or the field errors of amounts that aren't amounts (everything else the server checks). */
export function draftToBody(draft: DecisionDraft): { body: Record<string, unknown>; errors: FieldErrors } {
  const errors: FieldErrors = {};
  const allowanceCents = parseMoneyToCents(draft.allowance);
  if (allowanceCents === null) errors.allowanceCents = [MONEY_HINT];
  const options = draft.options.map((o, i) => {
    const priceCents = parseMoneyToCents(o.price);
    if (priceCents === null) errors[`options.${i}.priceCents`] = [MONEY_HINT];
    return {
      ...(o.id ? { id: o.id } : {}),
      label: o.label,
      priceCents,
      notes: o.notes || null,
      boardId: o.boardId || null,
      lines: o.lines.map((l) => ({
        finishId: l.finishId,
        quantity: l.quantity.trim() === "" || Number.isNaN(Number(l.quantity)) ? null : Number(l.quantity),
        unit: l.unit,
        location: l.location || null,
      })),
    };
  });
  return { body: { room: draft.room, title: draft.title, allowanceCents, dueDate: draft.dueDate, notify: draft.notify, options }, errors };
}
