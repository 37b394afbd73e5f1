import { index, integer, real, sqliteTable, text, uniqueIndex } from "drizzle-orm/sqlite-core";
import { users } from "./auth";
import { createdAt, day, id } from "./columns";
import { finishes } from "./library";
import { projects, rooms, suppliers } from "./studio";

/** Items that go straight into the specification without a client choice. */
export const fixedItems = sqliteTable(
  "fixed_item",
  {
    id: id(),
    projectId: text("project_id")
      .notNull()
      .references(() => projects.id, { onDelete: "cascade" }),
    roomId: text("room_id")
      .notNull()
      .references(() => rooms.id, { onDelete: "restrict" }),
    finishId: text("finish_id")
      .notNull()
      .references(() => finishes.id, { onDelete: "restrict" }),
    item: text("item").notNull(),
    location: text("location"),
    quantity: real("quantity").notNull(),
    unit: text("unit").notNull(),
    notes: text("notes"),
    createdAt: createdAt(),
  },
  (t) => [index("fixed_item_project_idx").on(t.projectId)],
);
export type FixedItem = typeof fixedItems.$inferSelect;

/** An issued revision never changes: content is the canonical JSON its sha256 was taken of. */
export const specRevisions = sqliteTable(
  "spec_revision",
  {
    id: id(),
    projectId: text("project_id")
      .notNull()
      .references(() => projects.id, { onDelete: "cascade" }),
    letter: text("letter").notNull(),
    sequence: integer("sequence").notNull(),
    issuedAt: createdAt(),
    issuedBy: text("issued_by")
      .notNull()
      .references(() => users.id, { onDelete: "restrict" }),
    content: text("content").notNull(),
    sha256: text("sha256").notNull(),
  },
  (t) => [uniqueIndex("spec_revision_letter_unique").on(t.projectId, t.sequence)],
);
export type SpecRevision = typeof specRevisions.$inferSelect;

export const specLines = sqliteTable(
  "spec_line",
  {
    id: id(),
    revisionId: text("revision_id")
      .notNull()
      .references(() => specRevisions.id, { onDelete: "cascade" }),
    /** Stable across revisions (decision or fixed item id) so revisions can be compared line by line. */
    lineKey: text("line_key").notNull(),
    room: text("room").notNull(),
    item: text("item").notNull(),
    location: text("location"),
    finishId: text("finish_id").references(() => finishes.id, { onDelete: "restrict" }),
    finishName: text("finish_name").notNull(),
    supplierId: text("supplier_id").references(() => suppliers.id, { onDelete: "set null" }),
    supplierName: text("supplier_name"),
    productCode: text("product_code"),
    quantity: real("quantity").notNull(),
    unit: text("unit").notNull(),
    leadTimeDays: integer("lead_time_days").notNull(),
    orderByDate: day("order_by_date"),
    cautions: text("cautions", { mode: "json" }).$type<string[]>().notNull().default([]),
    sortOrder: integer("sort_order").notNull().default(0),
  },
  (t) => [index("spec_line_revision_idx").on(t.revisionId, t.supplierId)],
);
export type SpecLine = typeof specLines.$inferSelect;

/** What a supplier records against a line of a revision issued to them. */
export const lineOrders = sqliteTable("line_order", {
  lineId: text("line_id")
    .primaryKey()
    .references(() => specLines.id, { onDelete: "cascade" }),
  orderedOn: day("ordered_on"),
  expectedOn: day("expected_on"),
  updatedBy: text("updated_by").references(() => users.id, { onDelete: "set null" }),
  updatedAt: integer("updated_at", { mode: "timestamp_ms" }).notNull(),
});
export type LineOrder = typeof lineOrders.$inferSelect;

export const supplierAcknowledgements = sqliteTable(
  "supplier_acknowledgement",
  {
    id: id(),
    revisionId: text("revision_id")
      .notNull()
      .references(() => specRevisions.id, { onDelete: "cascade" }),
    supplierId: text("supplier_id")
      .notNull()
      .references(() => suppliers.id, { onDelete: "cascade" }),
    userId: text("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "restrict" }),
    acknowledgedAt: createdAt(),
  },
  (t) => [uniqueIndex("supplier_ack_unique").on(t.revisionId, t.supplierId)],
);
export type SupplierAcknowledgement = typeof supplierAcknowledgements.$inferSelect;

/**
 * A designer's word that an issued line still stands although an approved variation changed the
 * decision it came from: the supplier may order it again without waiting for the next revision.
 */
export const lineConfirmations = sqliteTable(
  "line_confirmation",
  {
    lineId: text("line_id")
      .primaryKey()
      .references(() => specLines.id, { onDelete: "cascade" }),
    confirmedBy: text("confirmed_by").references(() => users.id, { onDelete: "set null" }),
    note: text("note"),
    confirmedAt: createdAt(),
  },
);
export type LineConfirmation = typeof lineConfirmations.$inferSelect;
