/**
 * Where a finish's uploaded photo is served from, 400 px wide. Null until the library's
 * authenticated file route exists; until then swatches show the flat measured colour.
 */
export const FILE_ROUTE_READY = false;

export function thumbnailUrl(storageKey: string | null | undefined): string | null {
  if (!FILE_ROUTE_READY || !storageKey) return null;
  return `/api/files/${encodeURIComponent(storageKey)}-400.webp`;
}
