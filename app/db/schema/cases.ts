import { sql } from "drizzle-orm";
import {
  boolean,
  check,
  doublePrecision,
  index,
  integer,
  pgTable,
  text,
  timestamp,
  unique,
  uuid,
} from "drizzle-orm/pg-core";
import { caseStateEnum, findingResultEnum, observationSourceEnum } from "./enums";
import { createdAt, id, updatedAt } from "./helpers";
import { causes, checks, symptoms } from "./knowledge";
import { members } from "./people";
import { vehicles } from "./vehicles";
import { workshops } from "./workshops";

export const cases = pgTable(
  "cases",
  {
    id: id(),
    workshopId: uuid("workshop_id")
      .notNull()
      .references(() => workshops.id, { onDelete: "cascade" }),
    number: integer("number").notNull(), // the workshop's own running number, shown on screens and paper
    vehicleId: uuid("vehicle_id")
      .notNull()
      .references(() => vehicles.id, { onDelete: "restrict" }),
    complaint: text("complaint").notNull(), // in the owner's words
    mileageKm: integer("mileage_km"),
    state: caseStateEnum("state").notNull().default("open"),
    assignedMemberId: uuid("assigned_member_id").references(() => members.id, { onDelete: "set null" }),
    openedById: uuid("opened_by_id").references(() => members.id, { onDelete: "set null" }),
    needsSenior: boolean("needs_senior").notNull().default(false),
    conclusionCauseId: uuid("conclusion_cause_id").references(() => causes.id, { onDelete: "restrict" }),
    conclusionNotes: text("conclusion_notes"),
    concludedById: uuid("concluded_by_id").references(() => members.id, { onDelete: "set null" }),
    signedOffById: uuid("signed_off_by_id").references(() => members.id, { onDelete: "set null" }),
    // Optimistic concurrency for the shared text fields (complaint, conclusion).
    version: integer("version").notNull().default(1),
    // The knowledge-base version the case is ranked with: set when it opens, moved on only when
    // someone asks, so a change to the base never re-ranks a case under a technician's hands.
    kbVersion: integer("kb_version").notNull().default(1),
    openedAt: timestamp("opened_at", { withTimezone: true }).notNull().defaultNow(),
    concludedAt: timestamp("concluded_at", { withTimezone: true }),
    closedAt: timestamp("closed_at", { withTimezone: true }),
    updatedAt: updatedAt(),
  },
  (t) => [
    unique("cases_workshop_number").on(t.workshopId, t.number),
    index("cases_workshop_state_idx").on(t.workshopId, t.state),
    index("cases_vehicle_idx").on(t.vehicleId),
    check("cases_mileage_nonneg", sql`${t.mileageKm} is null or ${t.mileageKm} >= 0`),
    check("cases_conclusion_has_cause", sql`${t.state} in ('open') or ${t.conclusionCauseId} is not null`),
  ],
);

// Observations and findings are rows, not a blob on the case: two people working one case
// add rows side by side and lose nothing.
export const observations = pgTable(
  "observations",
  {
    id: id(),
    workshopId: uuid("workshop_id")
      .notNull()
      .references(() => workshops.id, { onDelete: "cascade" }),
    caseId: uuid("case_id")
      .notNull()
      .references(() => cases.id, { onDelete: "cascade" }),
    symptomId: uuid("symptom_id")
      .notNull()
      .references(() => symptoms.id, { onDelete: "restrict" }),
    present: boolean("present").notNull(),
    source: observationSourceEnum("source").notNull().default("technician"),
    note: text("note"),
    recordedById: uuid("recorded_by_id").references(() => members.id, { onDelete: "set null" }),
    recordedAt: createdAt(),
  },
  (t) => [unique("observations_case_symptom").on(t.caseId, t.symptomId)],
);

export const findings = pgTable(
  "findings",
  {
    id: id(),
    workshopId: uuid("workshop_id")
      .notNull()
      .references(() => workshops.id, { onDelete: "cascade" }),
    caseId: uuid("case_id")
      .notNull()
      .references(() => cases.id, { onDelete: "cascade" }),
    checkId: uuid("check_id")
      .notNull()
      .references(() => checks.id, { onDelete: "restrict" }),
    result: findingResultEnum("result").notNull(),
    reading: text("reading"), // as typed, e.g. "0.09 mm"
    value: doublePrecision("value"), // the reading in the check's own unit
    unit: text("unit"),
    note: text("note"),
    recordedById: uuid("recorded_by_id").references(() => members.id, { onDelete: "set null" }),
    recordedAt: createdAt(),
  },
  (t) => [unique("findings_case_check").on(t.caseId, t.checkId)],
);

export type Case = typeof cases.$inferSelect;
export type Observation = typeof observations.$inferSelect;
export type Finding = typeof findings.$inferSelect;
