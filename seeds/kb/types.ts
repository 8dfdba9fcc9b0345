// The starter knowledge base as plain data. Seeding copies it into a workshop's own tables,
// where seniors then curate it. Keys are stable slugs so re-seeding is idempotent.
import type { BandFigures } from "../../app/reasoning/bands";
import type { Condition } from "../../app/reasoning/conditions";

export const SYSTEMS = [
  "brakes",
  "suspension_steering",
  "wheels_tyres",
  "driveline",
  "engine_fuel_emissions",
  "engine_mechanical",
  "cooling",
  "electrical",
  "exhaust",
  "body",
] as const;
export type System = (typeof SYSTEMS)[number];

export const SYMPTOM_KINDS = [
  "noise",
  "vibration",
  "pull", // pulls, wanders, heavy or vague steering, bouncy ride: how the car handles
  "warning_lamp", // a lamp on the instrument panel, by name
  "trouble_code", // a stored DTC (SAE J2012 / ISO 15031-6), typed as the code itself
  "smell",
  "leak",
  "consumption", // uses more fuel or oil than it should
  "electrical",
  "performance", // runs, starts, drives or works worse than it should
  "visible", // seen on the car: wear, damage, smoke, corrosion
] as const;
export type SymptomKind = (typeof SYMPTOM_KINDS)[number];

export const PRIORITIES = ["stop", "soon", "watch", "sound"] as const;
export type Priority = (typeof PRIORITIES)[number];

export const FUEL_TYPES = ["petrol", "diesel", "hybrid", "electric", "lpg"] as const;
export type FuelType = (typeof FUEL_TYPES)[number];

export const DRIVETRAINS = ["fwd", "rwd", "awd"] as const;
export type Drivetrain = (typeof DRIVETRAINS)[number];

export const SKILLS = ["apprentice", "technician", "senior"] as const;
export type Skill = (typeof SKILLS)[number];

export const ACCESS = ["ramp", "road_test", "scan_tool", "wheels_off", "bonnet_open", "cold_engine"] as const;
export type Access = (typeof ACCESS)[number];

export const CAUTIONS = [
  "lifting",
  "hot_parts",
  "fuel",
  "brake_hydraulics",
  "airbag",
  "high_voltage",
  "rotating_parts",
  "pressurised_cooling",
  "exhaust_fumes",
  "battery_acid",
] as const;
export type Caution = (typeof CAUTIONS)[number];

export type SymptomSeed = {
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

export type Applicability = {
  fuel?: FuelType[]; // absent: any fuel
  drivetrain?: Drivetrain[]; // absent: any drivetrain
  minAgeYears?: number;
  minKm?: number; // below this the cause is rarer: prior scaled by youngFactor
  youngFactor?: number; // default 0.3
};

export type CauseSeed = {
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
  partsCost?: number; // failure modes only: typical parts, in the workshop currency (demo: euro-like units)
  priority?: Priority; // failure modes only: how the owner should treat it
  applicability?: Applicability;
};

export type CheckResult =
  | { kind: "pass_fail"; failMeans: string }
  // rule is a mathjs comparison over `value` that is true when the reading PASSES, e.g. "value <= 0.05 mm"
  // gradeScale (optional): the distance from the limit that counts as one whole "miss" when the
  // reading is graded (well within / near / beyond / far beyond), where the limit itself is no
  // good scale (a limit of 0 mm, a voltage); see docs/reasoning.md.
  | { kind: "measurement"; quantity: string; unit: string; rule: string; failMeans: string; gradeScale?: string };

export type CheckSeed = {
  key: string;
  name: string;
  instructions: string[]; // ordered steps
  tools: string[];
  minutes: number;
  consumablesCost: number;
  access: Access[];
  skill: Skill;
  cautions: Caution[];
  result: CheckResult;
  falseAlarm: number; // P(check fails | none of its causes), in [0, 1]
};

// P(symptom | cause); `when` (optional): the conditions under which this cause shows the symptom.
export type SymptomLinkSeed = { symptom: string; cause: string; p: number; when?: Condition[] };
// P(check fails | cause), cause may be a tree node; `graded` (optional): P(reading band | cause)
// for a measurement, whose two failing bands add up to pFail (a senior can edit them).
export type CheckLinkSeed = { check: string; cause: string; pFail: number; graded?: BandFigures };

export type KnowledgeBaseSeed = {
  symptoms: SymptomSeed[];
  causes: CauseSeed[];
  checks: CheckSeed[];
  symptomLinks: SymptomLinkSeed[];
  checkLinks: CheckLinkSeed[];
};
