import type { RevisionJson } from "@/lib/spec/revision-json";

export type ApiError = Error & { status: number; fieldErrors?: Record<string, string[]> };

async function readOrThrow<T>(response: Response): Promise<T> {
  const body = (await response.json().catch(() => ({}))) as { error?: string; fieldErrors?: Record<string, string[]> };
  if (!response.ok) {
    const error = new Error(body.error ?? "Something went wrong. Please try again.") as ApiError;
    error.status = response.status;
    error.fieldErrors = body.fieldErrors;
    throw error;
  }
  return body as T;
}

export const revisionKey = (id: string) => ["revision", id] as const;

export async function fetchRevision(id: string): Promise<RevisionJson> {
  return readOrThrow(await fetch(`/api/revisions/${encodeURIComponent(id)}`, { cache: "no-store" }));
}

export async function postAcknowledgement(id: string): Promise<{ acknowledgedAt: string; created: boolean }> {
  return readOrThrow(await fetch(`/api/revisions/${encodeURIComponent(id)}/acknowledge`, { method: "POST" }));
}

export async function patchOrderDates(revisionId: string, lineId: string, dates: { orderedOn: string | null; expectedOn: string | null }) {
  return readOrThrow<{ orderedOn: string | null; expectedOn: string | null; status: string }>(
    await fetch(`/api/revisions/${encodeURIComponent(revisionId)}/lines/${encodeURIComponent(lineId)}`, {
      method: "PATCH",
      headers: { "Content-Type": "application/json" },
      body: JSON.stringify(dates),
    }),
  );
}
