import { index, integer, real, sqliteTable, text } from "drizzle-orm/sqlite-core";
import { users } from "./auth";
import { boards } from "./boards";
import { createdAt, day, id, updatedAt } from "./columns";
import { finishes } from "./library";
import { projects, rooms } from "./studio";

/** open: waiting for the client; chosen: a favourite picked, not yet approved; locked: approved. */
export const decisionStatuses = ["open", "chosen", "locked"] as const;
export type DecisionStatus = (typeof decisionStatuses)[number];

export const decisions = sqliteTable(
  "decision",
  {
    id: id(),
    projectId: text("project_id")
      .notNull()
      .references(() => projects.id, { onDelete: "cascade" }),
    roomId: text("room_id")
      .notNull()
      .references(() => rooms.id, { onDelete: "restrict" }),
    title: text("title").notNull(),
    /** The prime-cost allowance in the contract for this item, in cents. */
    allowanceCents: integer("allowance_cents").notNull(),
    dueDate: day("due_date").notNull(),
    status: text("status", { enum: decisionStatuses }).notNull().default("open"),
    /** The option the decision carries once locked (changed only by an approved variation). */
    lockedOptionId: text("locked_option_id"),
    lockedAt: integer("locked_at", { mode: "timestamp_ms" }),
    version: integer("version").notNull().default(1),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("decision_project_idx").on(t.projectId, t.dueDate)],
);
export type Decision = typeof decisions.$inferSelect;

export const options = sqliteTable(
  "decision_option",
  {
    id: id(),
    decisionId: text("decision_id")
      .notNull()
      .references(() => decisions.id, { onDelete: "cascade" }),
    label: text("label").notNull(),
    priceCents: integer("price_cents").notNull(),
    /** True when a designer typed the price instead of letting it be built from the lines (cost × markup × tax). */
    priceOverridden: integer("price_overridden", { mode: "boolean" }).notNull().default(false),
    notes: text("notes"),
    boardId: text("board_id").references(() => boards.id, { onDelete: "set null" }),
    sortOrder: integer("sort_order").notNull().default(0),
    /** Options added by a variation after lock are not offered as ordinary choices. */
    addedByVariation: integer("added_by_variation", { mode: "boolean" }).notNull().default(false),
    createdAt: createdAt(),
  },
  (t) => [index("option_decision_idx").on(t.decisionId)],
);
export type DecisionOption = typeof options.$inferSelect;

export const optionLines = sqliteTable(
  "option_line",
  {
    id: id(),
    optionId: text("option_id")
      .notNull()
      .references(() => options.id, { onDelete: "cascade" }),
    finishId: text("finish_id")
      .notNull()
      .references(() => finishes.id, { onDelete: "restrict" }),
    quantity: real("quantity").notNull(),
    unit: text("unit").notNull(),
    /** What the line is, as the trades name it ("Benchtop", "Splashback"); the decision's title when empty. */
    item: text("item"),
    location: text("location"),
    sortOrder: integer("sort_order").notNull().default(0),
  },
  (t) => [index("option_line_option_idx").on(t.optionId)],
);
export type OptionLine = typeof optionLines.$inferSelect;

/** Every pick a client makes, newest last; the latest is their current choice. */
export const choices = sqliteTable(
  "choice",
  {
    id: id(),
    decisionId: text("decision_id")
      .notNull()
      .references(() => decisions.id, { onDelete: "cascade" }),
    optionId: text("option_id")
      .notNull()
      .references(() => options.id, { onDelete: "cascade" }),
    userId: text("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "restrict" }),
    comment: text("comment"),
    createdAt: createdAt(),
  },
  // Newest pick of a decision, and a page of its history, straight from the index.
  (t) => [index("choice_decision_time_idx").on(t.decisionId, t.createdAt)],
);
export type Choice = typeof choices.$inferSelect;

export const approvals = sqliteTable(
  "approval",
  {
    id: id(),
    decisionId: text("decision_id")
      .notNull()
      .references(() => decisions.id, { onDelete: "cascade" }),
    optionId: text("option_id")
      .notNull()
      .references(() => options.id, { onDelete: "restrict" }),
    userId: text("user_id")
      .notNull()
      .references(() => users.id, { onDelete: "restrict" }),
    /** Set when this approval is of a variation rather than the first lock. */
    variationId: text("variation_id"),
    /** Exactly what the approver was shown: option, lines, finishes, prices, allowance, checks. */
    snapshot: text("snapshot", { mode: "json" }).$type<Record<string, unknown>>().notNull(),
    approvedAt: createdAt(),
  },
  (t) => [index("approval_decision_idx").on(t.decisionId)],
);
export type Approval = typeof approvals.$inferSelect;

export const variationStatuses = ["requested", "priced", "approved", "declined", "withdrawn"] as const;
export type VariationStatus = (typeof variationStatuses)[number];

export const variations = sqliteTable(
  "variation",
  {
    id: id(),
    decisionId: text("decision_id")
      .notNull()
      .references(() => decisions.id, { onDelete: "cascade" }),
    requestedBy: text("requested_by")
      .notNull()
      .references(() => users.id, { onDelete: "restrict" }),
    reason: text("reason").notNull(),
    optionId: text("option_id").references(() => options.id, { onDelete: "restrict" }),
    status: text("status", { enum: variationStatuses }).notNull().default("requested"),
    /** Difference against the locked option, including tax, in cents. */
    priceDeltaCents: integer("price_delta_cents"),
    timeImpactDays: integer("time_impact_days"),
    pricedBy: text("priced_by").references(() => users.id, { onDelete: "restrict" }),
    pricedAt: integer("priced_at", { mode: "timestamp_ms" }),
    decidedBy: text("decided_by").references(() => users.id, { onDelete: "restrict" }),
    decidedAt: integer("decided_at", { mode: "timestamp_ms" }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("variation_decision_idx").on(t.decisionId)],
);
export type Variation = typeof variations.$inferSelect;
