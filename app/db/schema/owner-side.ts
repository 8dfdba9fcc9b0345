import { sql } from "drizzle-orm";
import {
  boolean,
  check,
  index,
  integer,
  jsonb,
  pgEnum,
  pgTable,
  text,
  timestamp,
  unique,
  uuid,
} from "drizzle-orm/pg-core";
import {
  DECISIONS,
  ESTIMATE_LINE_KINDS,
  MAIL_STATES,
  PAYMENT_PURPOSES,
  PAYMENT_STATUSES,
} from "../../domain/owner-side";
import type { SentEstimateDocument } from "../../domain/estimate-document";
import { priorityEnum } from "./enums";
import { createdAt, id, updatedAt } from "./helpers";
import { cases } from "./cases";
import { causes } from "./knowledge";
import { members } from "./people";
import { workshops } from "./workshops";

export const estimateLineKindEnum = pgEnum("estimate_line_kind", ESTIMATE_LINE_KINDS);
export const decisionEnum = pgEnum("owner_decision", DECISIONS);
export const paymentStatusEnum = pgEnum("payment_status", PAYMENT_STATUSES);
export const paymentPurposeEnum = pgEnum("payment_purpose", PAYMENT_PURPOSES);
export const mailStateEnum = pgEnum("mail_state", MAIL_STATES);

// The estimate being drafted: items the owner approves or declines one by one, each with its lines.
// Money is integer minor units (pence for GBP); quantities are thousandths, so 1.5 h is 1500.
export const estimateItems = pgTable(
  "estimate_items",
  {
    id: id(),
    workshopId: uuid("workshop_id")
      .notNull()
      .references(() => workshops.id, { onDelete: "cascade" }),
    caseId: uuid("case_id")
      .notNull()
      .references(() => cases.id, { onDelete: "cascade" }),
    title: text("title").notNull(),
    causeId: uuid("cause_id").references(() => causes.id, { onDelete: "set null" }),
    priority: priorityEnum("priority").notNull(),
    // Work already done (the diagnosis itself): owed whatever the owner decides about the rest.
    required: boolean("required").notNull().default(false),
    position: integer("position").notNull().default(0),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("estimate_items_case_idx").on(t.caseId)],
);

export const estimateLines = pgTable(
  "estimate_lines",
  {
    id: id(),
    workshopId: uuid("workshop_id")
      .notNull()
      .references(() => workshops.id, { onDelete: "cascade" }),
    itemId: uuid("item_id")
      .notNull()
      .references(() => estimateItems.id, { onDelete: "cascade" }),
    kind: estimateLineKindEnum("kind").notNull(),
    description: text("description").notNull(),
    partNumber: text("part_number"),
    quantityMilli: integer("quantity_milli").notNull(),
    unitMinor: integer("unit_minor").notNull(), // as entered: net or tax-inclusive, per the workshop's setting
    taxRateBp: integer("tax_rate_bp").notNull(), // basis points: 2000 is 20 %, 0 a zero-rated line
    position: integer("position").notNull().default(0),
    createdAt: createdAt(),
  },
  (t) => [
    index("estimate_lines_item_idx").on(t.itemId),
    check("estimate_lines_quantity_pos", sql`${t.quantityMilli} > 0`),
    check("estimate_lines_rate_range", sql`${t.taxRateBp} between 0 and 9999`),
    check("estimate_lines_sign", sql`(${t.kind} = 'discount') = (${t.unitMinor} < 0) or ${t.unitMinor} = 0`),
  ],
);

// What the owner was sent, kept exactly as sent: a new send is a new version, never an edit.
export const sentEstimates = pgTable(
  "sent_estimates",
  {
    id: id(),
    workshopId: uuid("workshop_id")
      .notNull()
      .references(() => workshops.id, { onDelete: "cascade" }),
    caseId: uuid("case_id")
      .notNull()
      .references(() => cases.id, { onDelete: "cascade" }),
    version: integer("version").notNull(),
    document: jsonb("document").$type<SentEstimateDocument>().notNull(),
    toEmail: text("to_email").notNull(),
    sentById: uuid("sent_by_id").references(() => members.id, { onDelete: "set null" }),
    sentAt: timestamp("sent_at", { withTimezone: true }).notNull().defaultNow(),
    answeredAt: timestamp("answered_at", { withTimezone: true }),
    ownerNote: text("owner_note"),
  },
  (t) => [unique("sent_estimates_case_version").on(t.caseId, t.version)],
);

export const ownerDecisions = pgTable(
  "owner_decisions",
  {
    id: id(),
    sentEstimateId: uuid("sent_estimate_id")
      .notNull()
      .references(() => sentEstimates.id, { onDelete: "cascade" }),
    itemId: text("item_id").notNull(), // the item's id in the sent document
    decision: decisionEnum("decision").notNull(),
    decidedAt: createdAt(),
  },
  (t) => [unique("owner_decisions_item").on(t.sentEstimateId, t.itemId)],
);

// The owner's link: only a hash of its token is stored, so a copy of the database opens nothing.
export const ownerLinks = pgTable(
  "owner_links",
  {
    id: id(),
    workshopId: uuid("workshop_id")
      .notNull()
      .references(() => workshops.id, { onDelete: "cascade" }),
    sentEstimateId: uuid("sent_estimate_id")
      .notNull()
      .references(() => sentEstimates.id, { onDelete: "cascade" }),
    tokenHash: text("token_hash").notNull().unique(),
    expiresAt: timestamp("expires_at", { withTimezone: true }).notNull(),
    revokedAt: timestamp("revoked_at", { withTimezone: true }),
    revokedById: uuid("revoked_by_id").references(() => members.id, { onDelete: "set null" }),
    firstOpenedAt: timestamp("first_opened_at", { withTimezone: true }),
    lastOpenedAt: timestamp("last_opened_at", { withTimezone: true }),
    openCount: integer("open_count").notNull().default(0),
    createdAt: createdAt(),
  },
  (t) => [index("owner_links_sent_idx").on(t.sentEstimateId)],
);

// A payment asked of the owner, and what the payment service said about it. Amount and currency
// are ours: a webhook that disagrees is flagged, never believed.
export const payments = pgTable(
  "payments",
  {
    id: id(),
    workshopId: uuid("workshop_id")
      .notNull()
      .references(() => workshops.id, { onDelete: "cascade" }),
    caseId: uuid("case_id")
      .notNull()
      .references(() => cases.id, { onDelete: "cascade" }),
    sentEstimateId: uuid("sent_estimate_id")
      .notNull()
      .references(() => sentEstimates.id, { onDelete: "cascade" }),
    purpose: paymentPurposeEnum("purpose").notNull(),
    amountMinor: integer("amount_minor").notNull(),
    currency: text("currency").notNull(),
    status: paymentStatusEnum("status").notNull().default("open"),
    checkoutSessionId: text("checkout_session_id").unique(),
    paymentIntentId: text("payment_intent_id"),
    flaggedReason: text("flagged_reason"),
    paidAt: timestamp("paid_at", { withTimezone: true }),
    refundedAt: timestamp("refunded_at", { withTimezone: true }),
    refundId: text("refund_id"),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [index("payments_case_idx").on(t.caseId), check("payments_amount_pos", sql`${t.amountMinor} > 0`)],
);

// Every webhook event once, by the service's event id: a repeat is recognised in the same
// transaction as the effect; an event for a session we do not know is kept to be reconciled.
export const paymentEvents = pgTable("payment_events", {
  eventId: text("event_id").primaryKey(),
  type: text("type").notNull(),
  sessionId: text("session_id"),
  payload: jsonb("payload").notNull(),
  outcome: text("outcome").notNull(), // applied | ignored | unknown_session | mismatch | reconciled
  receivedAt: createdAt(),
});

// Mail waiting to go: written in the transaction of what it tells, delivered by the job queue.
export const mailOutbox = pgTable(
  "mail_outbox",
  {
    id: id(),
    workshopId: uuid("workshop_id").references(() => workshops.id, { onDelete: "cascade" }),
    caseId: uuid("case_id").references(() => cases.id, { onDelete: "set null" }),
    kind: text("kind").notNull(),
    toAddress: text("to_address").notNull(),
    subject: text("subject").notNull(),
    text: text("text").notNull(),
    state: mailStateEnum("state").notNull().default("queued"),
    attempts: integer("attempts").notNull().default(0),
    lastError: text("last_error"),
    createdAt: createdAt(),
    sentAt: timestamp("sent_at", { withTimezone: true }),
  },
  (t) => [index("mail_outbox_state_idx").on(t.state, t.createdAt)],
);

export type EstimateItem = typeof estimateItems.$inferSelect;
export type EstimateLine = typeof estimateLines.$inferSelect;
export type SentEstimate = typeof sentEstimates.$inferSelect;
export type Payment = typeof payments.$inferSelect;
export type MailOutboxRow = typeof mailOutbox.$inferSelect;
