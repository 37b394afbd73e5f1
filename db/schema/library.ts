import { index, integer, real, sqliteTable, text } from "drizzle-orm/sqlite-core";
import { users } from "./auth";
import { createdAt, id, updatedAt } from "./columns";
import { studios, suppliers } from "./studio";

export const finishCategories = [
  "stone",
  "cabinetry",
  "flooring",
  "tile",
  "tapware",
  "hardware",
  "lighting",
  "appliances",
  "paint",
] as const;
export type FinishCategory = (typeof finishCategories)[number];

/** Where a colour or LRV figure came from; a published figure outranks the others. */
export const colourSources = ["published", "photo", "computed"] as const;
export type ColourSource = (typeof colourSources)[number];

/** Uploaded sample photos, stored under uploads/ with generated names. */
export const images = sqliteTable(
  "image",
  {
    id: id(),
    studioId: text("studio_id")
      .notNull()
      .references(() => studios.id, { onDelete: "cascade" }),
    uploadedBy: text("uploaded_by").references(() => users.id, { onDelete: "set null" }),
    storageKey: text("storage_key").notNull().unique(),
    width: integer("width").notNull(),
    height: integer("height").notNull(),
    bytes: integer("bytes").notNull(),
    createdAt: createdAt(),
  },
  (t) => [index("image_studio_idx").on(t.studioId)],
);
export type Image = typeof images.$inferSelect;

export const finishes = sqliteTable(
  "finish",
  {
    id: id(),
    studioId: text("studio_id")
      .notNull()
      .references(() => studios.id, { onDelete: "cascade" }),
    supplierId: text("supplier_id").references(() => suppliers.id, { onDelete: "set null" }),
    name: text("name").notNull(),
    category: text("category", { enum: finishCategories }).notNull(),
    productCode: text("product_code"),
    /** Surface finish as the trade says it: polished, honed, matt, satin, gloss, textured, brushed… */
    surface: text("surface"),
    format: text("format"),
    unit: text("unit").notNull(),
    unitPriceCents: integer("unit_price_cents").notNull(),
    leadTimeDays: integer("lead_time_days").notNull(),
    careNotes: text("care_notes"),
    /** Keys into the one list of cautions in lib/cautions.ts. */
    cautions: text("cautions", { mode: "json" }).$type<string[]>().notNull().default([]),
    labL: real("lab_l").notNull(),
    labA: real("lab_a").notNull(),
    labB: real("lab_b").notNull(),
    colourSource: text("colour_source", { enum: colourSources }).notNull(),
    lrv: real("lrv").notNull(),
    lrvSource: text("lrv_source", { enum: colourSources }).notNull(),
    imageId: text("image_id").references(() => images.id, { onDelete: "set null" }),
    archivedAt: integer("archived_at", { mode: "timestamp_ms" }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    index("finish_studio_idx").on(t.studioId, t.category),
    index("finish_supplier_idx").on(t.supplierId),
    index("finish_lab_l_idx").on(t.studioId, t.labL),
  ],
);
export type Finish = typeof finishes.$inferSelect;
export type NewFinish = typeof finishes.$inferInsert;
