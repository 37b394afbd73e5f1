/**
 * What a supplier needs beside a frozen line to act on it without a phone call. None of it is in
 * the revision's hashed content (see lib/spec/types.ts): it is read when the revision is viewed,
 * so revisions issued before these fields existed still verify. Never a price.
 */
export type LineFinishDetail = {
  /** The finish's surface as the library says it now (e.g. "honed"). */
  surface: string | null;
  /** Its format (e.g. "20 mm slab, 3200 × 1600"). */
  format: string | null;
  /** The finish's photo, served through the signed-in upload route; null when it has none. */
  photo: { thumbUrl: string; url: string } | null;
};

/** Who at the studio answers a supplier's questions about a revision. */
export type StudioContact = { name: string; email: string; phone: string | null; studioName: string };

export const noFinishDetail: LineFinishDetail = { surface: null, format: null, photo: null };

/** "Honed, 20 mm slab, 3200 × 1600": surface then format, the way a supplier reads a finish. */
export function describeSurfaceFormat(detail: Pick<LineFinishDetail, "surface" | "format">): string | null {
  const surface = detail.surface?.trim();
  const parts = [surface ? surface.charAt(0).toUpperCase() + surface.slice(1) : null, detail.format?.trim() || null].filter(
    (p): p is string => Boolean(p),
  );
  return parts.length ? parts.join(", ") : null;
}

/** Where the line goes: the room, then the location within it when it says more than the room. */
export function describeWhere(line: { room: string; location: string | null }): string {
  const location = line.location?.trim();
  return location && location.toLowerCase() !== line.room.toLowerCase() ? `${line.room} · ${location}` : line.room;
}
