import type { DecisionView } from "@/lib/decisions/types";
import type { FieldErrors } from "@/lib/http";

/** A refused request with its status and field errors, so a form can show them beside the fields. */
export class DecisionRequestError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly fieldErrors?: FieldErrors,
  ) {
    super(message);
  }
}

const OFFLINE = "We could not reach Mottle. Check your connection and try again; nothing was changed.";

async function readAnswer<T>(res: Response): Promise<T> {
  const body: unknown = await res.json().catch(() => null);
  if (!res.ok) {
    const record = body && typeof body === "object" ? (body as { error?: unknown; fieldErrors?: FieldErrors }) : {};
    throw new DecisionRequestError(res.status, typeof record.error === "string" ? record.error : OFFLINE, record.fieldErrors);
  }
  return body as T;
}

async function send<T>(path: string, method: string, body: unknown): Promise<T> {
  let res: Response;
  try {
    res = await fetch(path, { method, headers: { "content-type": "application/json", accept: "application/json" }, body: JSON.stringify(body) });
  } catch {
    throw new DecisionRequestError(0, OFFLINE);
  }
  return readAnswer<T>(res);
}

export const decisionKey = (decisionId: string) => ["decision", decisionId] as const;

export async function fetchDecision(decisionId: string): Promise<DecisionView> {
  return readAnswer<DecisionView>(await fetch(`/api/decisions/${encodeURIComponent(decisionId)}`, { headers: { accept: "application/json" } }));
}

export const postJson = <T>(path: string, body: unknown) => send<T>(path, "POST", body);
export const patchJson = <T>(path: string, body: unknown) => send<T>(path, "PATCH", body);

export const decisionApi = (decisionId: string) => `/api/decisions/${encodeURIComponent(decisionId)}`;
