import { and, asc, desc, eq, inArray, or, sql } from "drizzle-orm";
import { db } from "@/db";
import { finishes, studioMembers, studios, users } from "@/db/schema";
import type { LineFinishDetail, StudioContact } from "@/lib/spec/line-detail";
import { imageUrl } from "@/lib/uploads/urls";

/**
 * Surface, format and photo of the finishes on a revision's lines, as the library holds them
 * now. Only these columns are read: never the finish's price.
 */
export async function readLineFinishDetails(finishIds: (string | null)[]): Promise<Map<string, LineFinishDetail>> {
  const ids = [...new Set(finishIds.filter((id): id is string => Boolean(id)))];
  if (ids.length === 0) return new Map();
  const rows = await db
    .select({ id: finishes.id, surface: finishes.surface, format: finishes.format, imageId: finishes.imageId })
    .from(finishes)
    .where(inArray(finishes.id, ids));
  return new Map(
    rows.map((r) => [
      r.id,
      {
        surface: r.surface,
        format: r.format,
        photo: r.imageId ? { thumbUrl: imageUrl(r.imageId, "400"), url: imageUrl(r.imageId, "1600") } : null,
      },
    ]),
  );
}

/**
 * The studio's contact for a revision: the person who issued it while they are still on the
 * studio's team, otherwise the studio's first owner. One indexed read (the member primary key).
 */
export async function readStudioContact(studioId: string, issuedBy: string): Promise<StudioContact | null> {
  const [row] = await db
    .select({ name: users.name, email: users.email, phone: users.phone, studioName: studios.name })
    .from(studioMembers)
    .innerJoin(users, eq(users.id, studioMembers.userId))
    .innerJoin(studios, eq(studios.id, studioMembers.studioId))
    .where(and(eq(studioMembers.studioId, studioId), or(eq(studioMembers.userId, issuedBy), eq(studioMembers.role, "owner"))))
    .orderBy(desc(sql`${studioMembers.userId} = ${issuedBy}`), asc(studioMembers.createdAt), asc(studioMembers.userId))
    .limit(1);
  if (!row) return null;
  return { name: row.name?.trim() || row.email, email: row.email, phone: row.phone?.trim() || null, studioName: row.studioName };
}
