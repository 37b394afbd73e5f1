import type { FinishDetail, FinishPage, FinishSummary } from "@/db/queries/finish-dto";
import type { FieldErrors } from "@/lib/http";
import type { Measurement, UploadMeasurement } from "@/lib/uploads/measured";
import type { FinishListQuery } from "@/lib/validation/finish";

/** A refusal from one of our routes, with its plain message and field errors. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly fieldErrors: FieldErrors = {},
    readonly body: Record<string, unknown> = {},
  ) {
    super(message);
  }
}

export async function requestJson<T>(url: string, init: RequestInit = {}): Promise<T> {
  const res = await fetch(url, { ...init, headers: { accept: "application/json", ...init.headers } });
  if (res.status === 204) return undefined as T;
  const body = (await res.json().catch(() => ({}))) as Record<string, unknown>;
  if (!res.ok) {
    const message = typeof body.error === "string" ? body.error : "Something went wrong. Nothing was changed; please try again.";
    throw new ApiError(res.status, message, (body.fieldErrors as FieldErrors | undefined) ?? {}, body);
  }
  return body as T;
}

export const sendJson = (method: "POST" | "PATCH" | "DELETE", body?: unknown): RequestInit => ({
  method,
  headers: { "content-type": "application/json" },
  body: body === undefined ? undefined : JSON.stringify(body),
});

/** Query keys: every cached library read starts with "finishes", so one invalidation refreshes them all. */
export const libraryKeys = {
  all: ["finishes"] as const,
  page: (query: FinishListQuery) => ["finishes", "page", query] as const,
  similar: (finishId: string, maxDeltaE: number, anyCategory = false) => ["finishes", "similar", finishId, maxDeltaE, anyCategory] as const,
};

/** The query string for a list query, leaving out defaults so links stay short. */
export function toSearch(query: FinishListQuery): string {
  const params = new URLSearchParams();
  if (query.q) params.set("q", query.q);
  if (query.category) params.set("category", query.category);
  if (query.supplier) params.set("supplier", query.supplier);
  if (query.status !== "current") params.set("status", query.status);
  if (query.sort !== "name") params.set("sort", query.sort);
  if (query.dir !== "asc") params.set("dir", query.dir);
  if (query.page !== 1) params.set("page", String(query.page));
  if (query.pageSize !== 50) params.set("pageSize", String(query.pageSize));
  const text = params.toString();
  return text ? `?${text}` : "";
}

export const fetchFinishPage = (query: FinishListQuery) => requestJson<FinishPage>(`/api/finishes${toSearch(query)}`);

export type SimilarAnswer = { maxDeltaE: number; anyCategory: boolean; items: (FinishSummary & { deltaE: number })[] };
export const fetchSimilar = (finishId: string, maxDeltaE: number, anyCategory = false) =>
  requestJson<SimilarAnswer>(`/api/finishes/${encodeURIComponent(finishId)}/similar?maxDeltaE=${maxDeltaE}${anyCategory ? "&anyCategory=1" : ""}`);

export type UploadAnswer = UploadMeasurement & { id: string; url: string; thumbUrl: string; width: number; height: number };

/** Measure a stored photo again; with a card, its box and reflectance (per cent) correct cast and exposure. */
export const measureAgain = (imageId: string, card?: { neutral: { left: number; top: number; width: number; height: number }; reflectance: number }) =>
  requestJson<Measurement>(`/api/uploads/${encodeURIComponent(imageId)}/measure`, sendJson("POST", card ?? {}));

export const saveFinish = (finishId: string | null, body: unknown) =>
  requestJson<FinishDetail>(finishId ? `/api/finishes/${encodeURIComponent(finishId)}` : "/api/finishes", sendJson(finishId ? "PATCH" : "POST", body));

/**
 * Uploads a photo with progress (fetch can't report upload progress; XMLHttpRequest can).
 * Resolves with the route's answer, or rejects with an ApiError carrying its message.
 */
export function uploadPhoto(file: File, onProgress: (fraction: number) => void): Promise<UploadAnswer> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open("POST", "/api/uploads");
    xhr.responseType = "json";
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable) onProgress(event.loaded / event.total);
    };
    xhr.onload = () => {
      const body = (xhr.response ?? {}) as Record<string, unknown>;
      if (xhr.status === 201) resolve(body as unknown as UploadAnswer);
      else reject(new ApiError(xhr.status, typeof body.error === "string" ? body.error : "The upload didn't go through. Try again."));
    };
    xhr.onerror = () => reject(new ApiError(0, "The upload didn't go through: check your connection and try again."));
    const form = new FormData();
    form.set("file", file);
    xhr.send(form);
  });
}
