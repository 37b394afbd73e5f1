import type { ActionResult } from "@/lib/actions/result";

/** The form-level message of an action result, announced to screen readers when it appears. */
export function FormMessage({ state, success }: { state: ActionResult<unknown>; success?: string }) {
  if (state.ok && success) {
    return (
      <p role="status" className="rounded-md bg-ok-wash px-3 py-2 text-ok-ink">
        {success}
      </p>
    );
  }
  if (!state.ok && state.error) {
    return (
      <p role="alert" className="rounded-md bg-problem-wash px-3 py-2 text-problem-ink">
        {state.error}
      </p>
    );
  }
  return null;
}
