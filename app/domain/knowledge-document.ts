// A whole knowledge base as one JSON document of our own format (docs/knowledge-format.md): the
// starter base every new workshop begins with, and what import and export read and write. Items
// refer to each other by key, never by database id, so a document moves between workshops.
// Browser-safe: the shapes and their zod schema, no database.
import { z } from "zod";
import {
  type Applicability,
  CAUSE_LEVELS,
  CAUTIONS,
  CHECK_ACCESS,
  type Caution,
  type CheckAccess,
  PRIORITIES,
  type Priority,
  SYMPTOM_KINDS,
  type SymptomKind,
  SYSTEMS,
  type System,
} from "~/domain/knowledge";
import { CONDITIONS, type Condition } from "~/domain/conditions";
import { SKILLS, type Skill } from "~/domain/people";
import type { BandFigures } from "~/domain/readings";
import { DRIVETRAINS, FUEL_TYPES } from "~/domain/vehicles";

export const KB_FORMAT = "ramplight.knowledge-base";
export const KB_FORMAT_VERSION = 1;

export type SymptomItem = {
  key: string;
  name: string; // in the words a technician says out loud, condition included ("Vibration under braking")
  synonyms: string[]; // owner and trade words: "judder", "shudder", "shake when I brake"
  system: System;
  kind: SymptomKind;
  code?: string; // kind "trouble_code" only, and required there: the code itself, upper case ("P0420")
  conditions: string[]; // "under braking", "over bumps", "cold start", "at idle", "cornering", "at speed"
  leak: number; // P(symptom | no listed cause) in [0, 1]
  // P(symptom | the fault is not in the knowledge base), where it should differ from the engine's
  // default max(leak, unlisted symptom rate): a starter estimate, as every figure here.
  unlisted?: number;
};

export type CauseItem = {
  key: string;
  parentKey: string | null; // null only for a system node
  level: "system" | "component" | "failure_mode";
  name: string;
  system: System;
  description: string; // for the technician
  // Failure modes only, and required there: what the owner summary says, in plain words.
  ownerDescription?: string; // what is wrong, for a car owner: one or two sentences, no jargon, no blame
  ifLeft?: string; // what happens if it is not put right, plainly and honestly
  baseRate?: number; // failure modes only: relative frequency among workshop visits, > 0
  repairMinutes?: number; // failure modes only: typical labour
  partsCost?: number; // failure modes only: typical parts, in the workshop currency
  priority?: Priority; // failure modes only: how the owner should treat it
  applicability?: Applicability;
};

export type CheckResult =
  | { kind: "pass_fail"; failMeans: string }
  // rule is a mathjs comparison over `value` that is true when the reading PASSES, e.g. "value <= 0.05 mm"
  // gradeScale (optional): the distance from the limit that counts as one whole "miss" when the
  // reading is graded (well within / near / beyond / far beyond), where the limit itself is no
  // good scale (a limit of 0 mm, a voltage); see docs/reasoning.md.
  | {
      kind: "measurement";
      quantity: string;
      unit: string;
      rule: string;
      failMeans: string;
      gradeScale?: string;
    };

export type CheckItem = {
  key: string;
  name: string;
  instructions: string[]; // ordered steps
  tools: string[];
  minutes: number;
  consumablesCost: number;
  access: CheckAccess[];
  skill: Skill;
  cautions: Caution[];
  result: CheckResult;
  falseAlarm: number; // P(check fails | none of its causes), in [0, 1]
};

// P(symptom | cause); `when` (optional): the conditions under which this cause shows the symptom.
export type SymptomLinkItem = { symptom: string; cause: string; p: number; when?: Condition[] };
// P(check fails | cause), cause may be a tree node; `graded` (optional): P(reading band | cause)
// for a measurement, whose two failing bands add up to pFail (a senior can edit them).
export type CheckLinkItem = { check: string; cause: string; pFail: number; graded?: BandFigures };

/** The items of a knowledge base, without the document's envelope. */
export type KnowledgeItems = {
  symptoms: SymptomItem[];
  causes: CauseItem[];
  checks: CheckItem[];
  symptomLinks: SymptomLinkItem[];
  checkLinks: CheckLinkItem[];
};

export type KnowledgeDocument = KnowledgeItems & {
  format: typeof KB_FORMAT;
  formatVersion: typeof KB_FORMAT_VERSION;
  name: string;
};

export const toDocument = (name: string, items: KnowledgeItems): KnowledgeDocument => ({
  format: KB_FORMAT,
  formatVersion: KB_FORMAT_VERSION,
  name,
  ...items,
});

// ---- the schema, for documents that come from outside ----

const key = z
  .string()
  .regex(/^[a-z0-9][a-z0-9_-]{0,79}$/, "a key is 1–80 lower-case letters, digits, _ or -");
const text = (max: number) => z.string().trim().min(1).max(max);
const probability = z.number().min(0, "a probability is at least 0").max(1, "a probability is at most 1");

const ApplicabilitySchema = z
  .object({
    fuel: z.array(z.enum(FUEL_TYPES)).optional(),
    drivetrain: z.array(z.enum(DRIVETRAINS)).optional(),
    minAgeYears: z.number().min(0).max(100).optional(),
    minKm: z.number().min(0).max(3_000_000).optional(),
    youngFactor: z.number().min(0).max(1).optional(),
  })
  .strict();

export const SymptomItemSchema = z
  .object({
    key,
    name: text(200),
    synonyms: z.array(text(120)).max(80),
    system: z.enum(SYSTEMS),
    kind: z.enum(SYMPTOM_KINDS),
    code: z
      .string()
      .regex(
        /^[PCBU][0-9A-F]{4}$/,
        "a trouble code is a letter P, C, B or U and four characters, such as P0420",
      )
      .optional(),
    conditions: z.array(text(80)).max(20),
    leak: probability,
    unlisted: probability.optional(),
  })
  .strict();

export const CauseItemSchema = z
  .object({
    key,
    parentKey: key.nullable(),
    level: z.enum(CAUSE_LEVELS),
    name: text(200),
    system: z.enum(SYSTEMS),
    description: z.string().max(2000),
    ownerDescription: z.string().max(1000).optional(),
    ifLeft: z.string().max(1000).optional(),
    baseRate: z.number().positive("a base rate is above 0").max(1000).optional(),
    repairMinutes: z.number().int().min(0).max(10_000).optional(),
    partsCost: z.number().min(0).max(1_000_000).optional(),
    priority: z.enum(PRIORITIES).optional(),
    applicability: ApplicabilitySchema.optional(),
  })
  .strict();

export const CheckItemSchema = z
  .object({
    key,
    name: text(200),
    instructions: z.array(text(1000)).max(40),
    tools: z.array(text(80)).max(30),
    minutes: z.number().positive().max(10_000),
    consumablesCost: z.number().min(0).max(100_000),
    access: z.array(z.enum(CHECK_ACCESS)),
    skill: z.enum(SKILLS),
    cautions: z.array(z.enum(CAUTIONS)),
    result: z.discriminatedUnion("kind", [
      z.object({ kind: z.literal("pass_fail"), failMeans: z.string().max(1000) }).strict(),
      z
        .object({
          kind: z.literal("measurement"),
          quantity: text(120),
          unit: z.string().max(20),
          rule: text(200),
          failMeans: z.string().max(1000),
          gradeScale: text(40).optional(),
        })
        .strict(),
    ]),
    falseAlarm: probability,
  })
  .strict();

export const KnowledgeDocumentSchema = z
  .object({
    format: z.literal(KB_FORMAT, {
      message: `this is not a Ramplight knowledge base (format must be "${KB_FORMAT}")`,
    }),
    formatVersion: z.literal(KB_FORMAT_VERSION, {
      message: `this reader takes format version ${KB_FORMAT_VERSION}`,
    }),
    name: text(120),
    symptoms: z.array(SymptomItemSchema).max(5_000),
    causes: z.array(CauseItemSchema).max(5_000),
    checks: z.array(CheckItemSchema).max(5_000),
    symptomLinks: z
      .array(
        z
          .object({
            symptom: key,
            cause: key,
            p: probability,
            when: z.array(z.enum(CONDITIONS)).max(10).optional(),
          })
          .strict(),
      )
      .max(50_000),
    checkLinks: z
      .array(
        z
          .object({
            check: key,
            cause: key,
            pFail: probability,
            graded: z
              .object({
                well_within: probability,
                near: probability,
                beyond: probability,
                far_beyond: probability,
              })
              .strict()
              .optional(),
          })
          .strict()
          .refine(
            (l) =>
              !l.graded ||
              Math.abs(l.graded.well_within + l.graded.near + l.graded.beyond + l.graded.far_beyond - 1) <
                1e-6,
            "the four band figures of a graded link add up to 1",
          )
          .refine(
            (l) => !l.graded || Math.abs(l.graded.beyond + l.graded.far_beyond - l.pFail) < 1e-6,
            "a graded link's two failing bands add up to its pFail",
          ),
      )
      .max(50_000),
  })
  .strict();
