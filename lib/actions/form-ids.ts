import { z } from "zod";
import { notFound } from "@/lib/http";

// Ids are generated UUIDs or the demo's fixed ids: letters, digits and hyphens.
const recordId = z.string().trim().min(1).max(100).regex(/^[A-Za-z0-9_-]+$/);

/**
 * Reads a record id a form carries in a hidden input (forms post ids, never bind them in the
 * browser: see DEVELOPERS.md). A missing or malformed id is answered like a wrong address.
 */
export function readFormId(form: FormData, name: string, what = "That"): string {
  const parsed = recordId.safeParse(form.get(name));
  if (!parsed.success) throw notFound(what);
  return parsed.data;
}

/** Like readFormId, but an empty or absent field means "none" (a form that adds rather than changes). */
export function readOptionalFormId(form: FormData, name: string, what = "That"): string | null {
  const value = form.get(name);
  if (value === null || value === "") return null;
  return readFormId(form, name, what);
}
