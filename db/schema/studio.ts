import { index, integer, primaryKey, sqliteTable, text, uniqueIndex } from "drizzle-orm/sqlite-core";
import { users } from "./auth";
import { createdAt, day, id } from "./columns";

export const studios = sqliteTable("studio", {
  id: id(),
  name: text("name").notNull(),
  /** Studio overrides of the colour-check thresholds, as JSON; absent keys use the defaults. */
  checkSettings: text("check_settings", { mode: "json" }).$type<Record<string, number>>(),
  /** The studio's markup on cost, in basis points (1500 = 15 %), applied when an option's price is built from its lines. */
  markupBasisPoints: integer("markup_basis_points").notNull().default(0),
  /** Sales tax on the client's price, in basis points: GST 10 % = 1000 by default. Prices shown to clients include it. */
  taxBasisPoints: integer("tax_basis_points").notNull().default(1000),
  /**
   * Which access rule the low-vision contrast check follows: AS 1428.1 luminance contrast (30 %),
   * BS 8300-2 LRV difference (30 points), or both. Named in every verdict.
   */
  accessStandard: text("access_standard", { enum: ["as1428", "bs8300", "both"] }).notNull().default("as1428"),
  createdAt: createdAt(),
});
export type Studio = typeof studios.$inferSelect;

export const studioRoles = ["owner", "designer"] as const;
export type StudioRole = (typeof studioRoles)[number];

export const studioMembers = sqliteTable(
  "studio_member",
  {
    studioId: text("studio_id")
      .notNull()
      .references(() => studios.id, { onDelete: "cascade" }),
    userId: text("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    role: text("role", { enum: studioRoles }).notNull(),
    createdAt: createdAt(),
  },
  (t) => [primaryKey({ columns: [t.studioId, t.userId] }), index("studio_member_user_idx").on(t.userId)],
);
export type StudioMember = typeof studioMembers.$inferSelect;

/** What a supplier or trade does (labels in lib/suppliers/trades.ts). The first nine are the original keys; keep them. */
/**
 * An invitation to join a studio's team sent to an address that already has an account. The
 * person sees it after signing in and joins only if they accept; the inviting studio sees it as
 * "invited, not joined yet", exactly like a brand-new designer who has not signed in.
 */
export const studioInvitations = sqliteTable(
  "studio_invitation",
  {
    id: id(),
    studioId: text("studio_id")
      .notNull()
      .references(() => studios.id, { onDelete: "cascade" }),
    email: text("email").notNull(),
    /** The name the studio typed for them. */
    name: text("name"),
    role: text("role", { enum: studioRoles }).notNull(),
    invitedBy: text("invited_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("studio_invitation_unique").on(t.studioId, t.email), index("studio_invitation_email_idx").on(t.email)],
);
export type StudioInvitation = typeof studioInvitations.$inferSelect;

export const trades = [
  "stone",
  "joinery",
  "flooring",
  "tiles",
  "tapware",
  "hardware",
  "lighting",
  "appliances",
  "paint",
  "electrician",
  "plumber",
  "builder",
  "other",
] as const;
export type Trade = (typeof trades)[number];

export const suppliers = sqliteTable(
  "supplier",
  {
    id: id(),
    studioId: text("studio_id")
      .notNull()
      .references(() => studios.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    trade: text("trade", { enum: trades }).notNull(),
    email: text("email"),
    phone: text("phone"),
    /** The studio's account number with this supplier, quoted on orders. */
    accountNumber: text("account_number"),
    notes: text("notes"),
    /** Archived suppliers keep their history but are offered nowhere new. */
    archivedAt: integer("archived_at", { mode: "timestamp_ms" }),
    createdAt: createdAt(),
  },
  (t) => [index("supplier_studio_idx").on(t.studioId)],
);
export type Supplier = typeof suppliers.$inferSelect;

/** The people at a supplier the studio deals with. Inviting one to a project is separate (project_member). */
export const supplierContacts = sqliteTable(
  "supplier_contact",
  {
    id: id(),
    supplierId: text("supplier_id")
      .notNull()
      .references(() => suppliers.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    email: text("email"),
    phone: text("phone"),
    /** What they do there, in the studio's words: "Sales", "Accounts", "Site measure". */
    role: text("role"),
    sortOrder: integer("sort_order").notNull().default(0),
    createdAt: createdAt(),
  },
  (t) => [index("supplier_contact_supplier_idx").on(t.supplierId)],
);
export type SupplierContact = typeof supplierContacts.$inferSelect;

export const projects = sqliteTable(
  "project",
  {
    id: id(),
    studioId: text("studio_id")
      .notNull()
      .references(() => studios.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    siteAddress: text("site_address"),
    installDate: day("install_date"),
    archivedAt: integer("archived_at", { mode: "timestamp_ms" }),
    createdAt: createdAt(),
  },
  (t) => [index("project_studio_idx").on(t.studioId)],
);
export type Project = typeof projects.$inferSelect;

export const projectRoles = ["client", "supplier"] as const;
export type ProjectRole = (typeof projectRoles)[number];

export const projectMembers = sqliteTable(
  "project_member",
  {
    id: id(),
    projectId: text("project_id")
      .notNull()
      .references(() => projects.id, { onDelete: "cascade" }),
    userId: text("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "cascade" }),
    role: text("role", { enum: projectRoles }).notNull(),
    /** Set for supplier members: the company whose lines they may see. */
    supplierId: text("supplier_id").references(() => suppliers.id, { onDelete: "cascade" }),
    invitedBy: text("invited_by").references(() => users.id, { onDelete: "set null" }),
    /** The person's name as this project's studio typed it; never shown to another studio. */
    displayName: text("display_name"),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("project_member_unique").on(t.projectId, t.userId), index("project_member_user_idx").on(t.userId)],
);
export type ProjectMember = typeof projectMembers.$inferSelect;

/**
 * An invitation to a project that the person has not accepted yet. Someone who already has an
 * account sees it on their home page and joins only when they accept; nothing of theirs is shown
 * to the inviting studio meanwhile.
 */
export const projectInvitations = sqliteTable(
  "project_invitation",
  {
    id: id(),
    projectId: text("project_id")
      .notNull()
      .references(() => projects.id, { onDelete: "cascade" }),
    email: text("email").notNull(),
    /** The name the studio typed for them. */
    name: text("name"),
    role: text("role", { enum: projectRoles }).notNull(),
    supplierId: text("supplier_id").references(() => suppliers.id, { onDelete: "cascade" }),
    invitedBy: text("invited_by").references(() => users.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex("project_invitation_unique").on(t.projectId, t.email), index("project_invitation_email_idx").on(t.email)],
);
export type ProjectInvitation = typeof projectInvitations.$inferSelect;

export const rooms = sqliteTable(
  "room",
  {
    id: id(),
    projectId: text("project_id")
      .notNull()
      .references(() => projects.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    sortOrder: integer("sort_order").notNull().default(0),
    createdAt: createdAt(),
  },
  (t) => [index("room_project_idx").on(t.projectId)],
);
export type Room = typeof rooms.$inferSelect;
