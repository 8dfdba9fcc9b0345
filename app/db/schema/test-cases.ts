import { index, integer, jsonb, pgTable, text, uuid } from "drizzle-orm/pg-core";
import type { Evidence } from "../../reasoning";
import { cases } from "./cases";
import { drivetrainEnum, fuelTypeEnum } from "./enums";
import { createdAt, id } from "./helpers";
import { causes } from "./knowledge";
import { members } from "./people";
import { workshops } from "./workshops";

// The workshop's own regression set for its knowledge base: a complaint, the evidence, the vehicle
// facts the ranking depends on and the known answer. The impact preview ranks them before and
// after a change, beside the workshop's concluded cases. Usually kept from a concluded case.
export const kbTestCases = pgTable(
  "kb_test_cases",
  {
    id: id(),
    workshopId: uuid("workshop_id")
      .notNull()
      .references(() => workshops.id, { onDelete: "cascade" }),
    name: text("name").notNull(),
    complaint: text("complaint").notNull(),
    fuelType: fuelTypeEnum("fuel_type").notNull(),
    drivetrain: drivetrainEnum("drivetrain").notNull(),
    year: integer("year").notNull(),
    mileageKm: integer("mileage_km"),
    evidence: jsonb("evidence").$type<Evidence>().notNull(),
    answerCauseId: uuid("answer_cause_id")
      .notNull()
      .references(() => causes.id, { onDelete: "restrict" }),
    fromCaseId: uuid("from_case_id").references(() => cases.id, { onDelete: "set null" }),
    keptById: uuid("kept_by_id").references(() => members.id, { onDelete: "set null" }),
    createdAt: createdAt(),
  },
  (t) => [index("kb_test_cases_workshop_idx").on(t.workshopId)],
);
