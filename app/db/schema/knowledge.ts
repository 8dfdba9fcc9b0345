import { sql } from "drizzle-orm";
import {
  type AnyPgColumn,
  check,
  doublePrecision,
  index,
  integer,
  jsonb,
  numeric,
  pgTable,
  primaryKey,
  text,
  timestamp,
  unique,
  uuid,
} from "drizzle-orm/pg-core";
import type { Applicability } from "../../domain/knowledge";
import type { KnowledgeDocument } from "../../domain/knowledge-document";
import type { BandFigures } from "../../domain/readings";
import {
  causeLevelEnum,
  priorityEnum,
  resultKindEnum,
  skillEnum,
  symptomKindEnum,
  systemEnum,
} from "./enums";
import { createdAt, id, updatedAt } from "./helpers";
import { workshops } from "./workshops";

const probability = (name: string, column: AnyPgColumn) =>
  check(name, sql`${column} >= 0 and ${column} <= 1`);

// Each workshop owns its knowledge base (copied from the starter base), so seniors can curate it.
export const symptoms = pgTable(
  "symptoms",
  {
    id: id(),
    workshopId: uuid("workshop_id")
      .notNull()
      .references(() => workshops.id, { onDelete: "cascade" }),
    key: text("key").notNull(),
    name: text("name").notNull(),
    synonyms: text("synonyms")
      .array()
      .notNull()
      .default(sql`'{}'::text[]`),
    system: systemEnum("system").notNull(),
    kind: symptomKindEnum("kind").notNull(),
    code: text("code"), // the DTC itself ("P0420") for kind trouble_code, otherwise null
    conditions: text("conditions")
      .array()
      .notNull()
      .default(sql`'{}'::text[]`),
    leak: doublePrecision("leak").notNull(),
    // P(symptom | the fault is not in the knowledge base), where it differs from the engine's default.
    unlisted: doublePrecision("unlisted"),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    unique("symptoms_workshop_key").on(t.workshopId, t.key),
    probability("symptoms_leak_range", t.leak),
    check(
      "symptoms_unlisted_range",
      sql`${t.unlisted} is null or (${t.unlisted} >= 0 and ${t.unlisted} <= 1)`,
    ),
  ],
);

export const causes = pgTable(
  "causes",
  {
    id: id(),
    workshopId: uuid("workshop_id")
      .notNull()
      .references(() => workshops.id, { onDelete: "cascade" }),
    key: text("key").notNull(),
    parentId: uuid("parent_id").references((): AnyPgColumn => causes.id, { onDelete: "restrict" }),
    level: causeLevelEnum("level").notNull(),
    name: text("name").notNull(),
    system: systemEnum("system").notNull(),
    description: text("description").notNull().default(""),
    ownerDescription: text("owner_description").notNull().default(""), // failure modes: plain words for the owner
    ifLeft: text("if_left").notNull().default(""), // failure modes: what happens if it is not put right
    baseRate: doublePrecision("base_rate"),
    repairMinutes: integer("repair_minutes"),
    partsCost: numeric("parts_cost", { precision: 10, scale: 2, mode: "number" }),
    priority: priorityEnum("priority"),
    applicability: jsonb("applicability").$type<Applicability>().notNull().default({}),
    // A retired cause is no longer ranked; cases that refer to it keep showing it.
    retiredAt: timestamp("retired_at", { withTimezone: true }),
    // Set when the cause was merged into another (it is then retired too); cases keep naming it.
    mergedIntoId: uuid("merged_into_id").references((): AnyPgColumn => causes.id, { onDelete: "set null" }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    unique("causes_workshop_key").on(t.workshopId, t.key),
    index("causes_parent_idx").on(t.parentId),
    check("causes_root_is_system", sql`(${t.parentId} is null) = (${t.level} = 'system')`),
    check(
      "causes_leaf_figures",
      sql`(${t.level} = 'failure_mode') = (${t.baseRate} is not null and ${t.priority} is not null)`,
    ),
    check("causes_base_rate_pos", sql`${t.baseRate} is null or ${t.baseRate} > 0`),
    check(
      "causes_costs_nonneg",
      sql`coalesce(${t.repairMinutes}, 0) >= 0 and coalesce(${t.partsCost}, 0) >= 0`,
    ),
  ],
);

export const checks = pgTable(
  "checks",
  {
    id: id(),
    workshopId: uuid("workshop_id")
      .notNull()
      .references(() => workshops.id, { onDelete: "cascade" }),
    key: text("key").notNull(),
    name: text("name").notNull(),
    instructions: text("instructions")
      .array()
      .notNull()
      .default(sql`'{}'::text[]`),
    tools: text("tools")
      .array()
      .notNull()
      .default(sql`'{}'::text[]`),
    minutes: integer("minutes").notNull(),
    consumablesCost: numeric("consumables_cost", { precision: 10, scale: 2, mode: "number" })
      .notNull()
      .default(0),
    access: text("access")
      .array()
      .notNull()
      .default(sql`'{}'::text[]`),
    skill: skillEnum("skill").notNull(),
    cautions: text("cautions")
      .array()
      .notNull()
      .default(sql`'{}'::text[]`),
    resultKind: resultKindEnum("result_kind").notNull(),
    quantity: text("quantity"),
    unit: text("unit"),
    rule: text("rule"), // a mathjs comparison over `value`, true when the reading passes
    failMeans: text("fail_means").notNull().default(""),
    gradeScale: text("grade_scale"), // measurements: the distance from the limit that counts as one whole miss
    falseAlarm: doublePrecision("false_alarm").notNull(),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    unique("checks_workshop_key").on(t.workshopId, t.key),
    probability("checks_false_alarm_range", t.falseAlarm),
    check("checks_costs_nonneg", sql`${t.minutes} >= 0 and ${t.consumablesCost} >= 0`),
    check(
      "checks_measurement_rule",
      sql`${t.resultKind} = 'pass_fail' or (${t.rule} is not null and ${t.unit} is not null)`,
    ),
  ],
);

export const symptomLinks = pgTable(
  "symptom_links",
  {
    workshopId: uuid("workshop_id")
      .notNull()
      .references(() => workshops.id, { onDelete: "cascade" }),
    symptomId: uuid("symptom_id")
      .notNull()
      .references(() => symptoms.id, { onDelete: "cascade" }),
    causeId: uuid("cause_id")
      .notNull()
      .references(() => causes.id, { onDelete: "cascade" }),
    p: doublePrecision("p").notNull(),
    // The conditions under which the cause shows this symptom at all ("under braking"); empty: always.
    when: text("when")
      .array()
      .notNull()
      .default(sql`'{}'::text[]`),
  },
  (t) => [
    primaryKey({ columns: [t.symptomId, t.causeId] }),
    index("symptom_links_workshop_idx").on(t.workshopId),
    index("symptom_links_cause_idx").on(t.causeId),
    probability("symptom_links_p_range", t.p),
  ],
);

export const checkLinks = pgTable(
  "check_links",
  {
    workshopId: uuid("workshop_id")
      .notNull()
      .references(() => workshops.id, { onDelete: "cascade" }),
    checkId: uuid("check_id")
      .notNull()
      .references(() => checks.id, { onDelete: "cascade" }),
    causeId: uuid("cause_id")
      .notNull()
      .references(() => causes.id, { onDelete: "cascade" }),
    pFail: doublePrecision("p_fail").notNull(),
    // A measurement's reading graded in four bands (docs/reasoning.md); null: pass or fail only.
    graded: jsonb("graded").$type<BandFigures>(),
  },
  (t) => [
    primaryKey({ columns: [t.checkId, t.causeId] }),
    index("check_links_workshop_idx").on(t.workshopId),
    index("check_links_cause_idx").on(t.causeId),
    probability("check_links_p_range", t.pFail),
  ],
);

// Knowledge bases a new workshop can start from, as documents of our own format (app/domain/knowledge-document.ts).
// Not a workshop's row: the starter base is written here by the seed and copied at workshop creation.
export const kbTemplates = pgTable("kb_templates", {
  key: text("key").primaryKey(), // "starter"
  document: jsonb("document").$type<KnowledgeDocument>().notNull(),
  updatedAt: updatedAt(),
});

export type Symptom = typeof symptoms.$inferSelect;
export type Cause = typeof causes.$inferSelect;
export type Check = typeof checks.$inferSelect;
