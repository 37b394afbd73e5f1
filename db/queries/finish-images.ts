import { and, eq, sql, type SQL } from "drizzle-orm";
import { db } from "@/db";
import { writeTransaction } from "./serial-write";
import { images, type Image } from "@/db/schema";
import { isStaffOfStudio } from "@/lib/auth/permissions";
import { notFound } from "@/lib/http";
import type { ImageKind } from "@/lib/uploads/limits";
import type { ProcessedPhoto } from "@/lib/uploads/pipeline";
import { createStorageKey, removePhotoFiles, writePhotoFiles } from "@/lib/uploads/storage";
import { writeAudit } from "./audit";
import { requireStudioId } from "./finishes";
import type { Actor } from "./users";

/**
 * Stores a processed photo: the row and the three files land together or not at all. Files are
 * written inside the write transaction, and removed again if it doesn't commit.
 */
export async function saveUploadedPhoto(actor: Actor, kind: ImageKind, photo: ProcessedPhoto): Promise<Image> {
  const studioId = requireStudioId(actor);
  const storageKey = createStorageKey(kind);
  try {
    return await writeTransaction(async (tx) => {
      const [image] = await tx
        .insert(images)
        .values({ studioId, uploadedBy: actor.userId, storageKey, width: photo.width, height: photo.height, bytes: photo.original.byteLength })
        .returning();
      if (!image) throw new Error("image insert returned nothing");
      await writeAudit(
        { studioId, actorId: actor.userId, action: "image.uploaded", entityType: "image", entityId: image.id, detail: { width: photo.width, height: photo.height, kind } },
        tx,
      );
      await writePhotoFiles(storageKey, { original: photo.original, "1600": photo.large, "400": photo.thumb });
      return image;
    });
  } catch (error) {
    await removePhotoFiles(storageKey);
    throw error;
  }
}

/** A photo of the studio's own library, for its staff (re-measuring, attaching to a finish). */
export async function getStudioImage(actor: Actor, imageId: string): Promise<Image> {
  const studioId = requireStudioId(actor);
  const image = await db.query.images.findFirst({ where: and(eq(images.id, imageId), eq(images.studioId, studioId)) });
  if (!image) throw notFound("That photo");
  return image;
}

const list = (values: string[]) => sql.join(values.map((v) => sql`${v}`), sql`, `);

/** Clients see a photo when their project uses its finish anywhere: a board, an option, a fixed item, a specification. */
function clientUses(projectIds: string[]): SQL {
  const ids = list(projectIds);
  return sql`(
    exists (select 1 from "board_item" bi join "board" b on b."id" = bi."board_id" where bi."finish_id" = f."id" and b."project_id" in (${ids}))
    or exists (select 1 from "option_line" ol join "decision_option" o on o."id" = ol."option_id" join "decision" d on d."id" = o."decision_id"
               where ol."finish_id" = f."id" and d."project_id" in (${ids}))
    or exists (select 1 from "fixed_item" fi where fi."finish_id" = f."id" and fi."project_id" in (${ids}))
    or exists (select 1 from "spec_line" sl join "spec_revision" r on r."id" = sl."revision_id" where sl."finish_id" = f."id" and r."project_id" in (${ids}))
  )`;
}

/** Suppliers see only what was issued to them: a line of their own in a specification revision. */
function supplierUses(memberships: { projectId: string; supplierId: string }[]): SQL {
  const each = memberships.map(
    (m) => sql`exists (select 1 from "spec_line" sl join "spec_revision" r on r."id" = sl."revision_id"
                       where sl."finish_id" = f."id" and r."project_id" = ${m.projectId} and sl."supplier_id" = ${m.supplierId})`,
  );
  return sql`(${sql.join(each, sql` or `)})`;
}

/**
 * The one check before a photo is served: staff of the owning studio, or a client or supplier
 * of a project that uses a finish with this photo. Everyone else gets 404, as if it weren't there.
 */
export async function getViewableImage(actor: Actor, imageId: string): Promise<Image> {
  const image = await db.query.images.findFirst({ where: eq(images.id, imageId) });
  if (!image) throw notFound("That photo");
  if (isStaffOfStudio(actor, image.studioId)) return image;
  const memberships = actor.projects.filter((p) => p.studioId === image.studioId);
  const clientProjects = memberships.filter((p) => p.role === "client").map((p) => p.projectId);
  const supplierLines = memberships.flatMap((p) => (p.role === "supplier" && p.supplierId ? [{ projectId: p.projectId, supplierId: p.supplierId }] : []));
  const uses = [...(clientProjects.length ? [clientUses(clientProjects)] : []), ...(supplierLines.length ? [supplierUses(supplierLines)] : [])];
  if (uses.length === 0) throw notFound("That photo");
  const rows = await db.all<{ one: number }>(
    sql`select 1 as one from "finish" f where f."image_id" = ${image.id} and f."studio_id" = ${image.studioId} and (${sql.join(uses, sql` or `)}) limit 1`,
  );
  if (rows.length === 0) throw notFound("That photo");
  return image;
}
