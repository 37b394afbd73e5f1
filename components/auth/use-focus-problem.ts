"use client";

import { useEffect, type RefObject } from "react";
import { firstInvalid, type ActionResult } from "@/lib/actions/result";

/**
 * The field a refused form should put the cursor in: the first (in `order`) with an error, else
 * `fallback` (say, the password after a wrong one), else none (the message is announced anyway).
 */
export function fieldToFix(state: ActionResult, order: readonly string[], fallback?: string): string | undefined {
  if (state.ok || !state.error) return undefined;
  return firstInvalid(state, order) ?? fallback;
}

/**
 * Moves focus to that field each time the form comes back refused. Without JavaScript the
 * field's `autoFocus` (rendered by the server) does the same.
 */
export function useFocusProblem(form: RefObject<HTMLFormElement | null>, state: ActionResult, name: string | undefined) {
  useEffect(() => {
    if (!name) return;
    const field = form.current?.elements.namedItem(name);
    if (field instanceof HTMLInputElement) field.focus();
  }, [form, state, name]);
}
