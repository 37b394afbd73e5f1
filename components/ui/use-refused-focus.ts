"use client";

import { useEffect, useRef } from "react";
import { firstInvalid, type ActionResult } from "@/lib/actions/result";

/**
 * Focus for a form whose submit may be refused. With JavaScript, after each refused submit the
 * focus moves to the first field marked invalid (in page order). Without JavaScript the page is
 * drawn afresh, so `autoFocus(name)` puts the `autofocus` attribute on the first field at fault.
 * `order` lists the form's field names top to bottom.
 */
export function useRefusedFocus(state: ActionResult<unknown>, order: readonly string[]) {
  const formRef = useRef<HTMLFormElement>(null);
  useEffect(() => {
    if (state.ok || !state.error) return;
    formRef.current?.querySelector<HTMLElement>('[aria-invalid="true"]')?.focus();
  }, [state]);
  const first = firstInvalid(state, order);
  return { formRef, autoFocus: (name: string) => name === first };
}
