// Small builders so the per-system files read like a senior's notes rather than boilerplate.
// They only fill in the repetitive fields; every value a curator cares about stays in the
// system files.

import type { BandFigures } from "../../app/reasoning/bands";
import type {
  Applicability,
  CauseSeed,
  CheckLinkSeed,
  KnowledgeBaseSeed,
  Priority,
  SymptomLinkSeed,
  SymptomSeed,
  System,
} from "./types";

/** The root of one system's cause tree. Its key is the system name itself. */
export function systemNode(system: System, name: string, description: string): CauseSeed {
  return { key: system, parentKey: null, level: "system", name, system, description };
}

/** A component directly under its system node. */
export function componentNode(system: System, key: string, name: string, description: string): CauseSeed {
  return { key, parentKey: system, level: "component", name, system, description };
}

export type FailureModeFields = {
  key: string;
  name: string;
  description: string;
  ownerDescription: string; // plain words for the owner: what is wrong
  ifLeft: string; // plain words for the owner: what happens if it is left
  baseRate: number;
  repairMinutes: number;
  partsCost: number;
  priority: Priority;
  applicability?: Applicability;
};

/** A failure mode (a leaf: what the technician confirms and the owner pays to put right). */
export function failureMode(system: System, parentKey: string, f: FailureModeFields): CauseSeed {
  return { ...f, parentKey, level: "failure_mode", system };
}

/** Symptom links written cause-first: "this fault shows itself as…", each with P(symptom | cause). */
export function producesSymptoms(cause: string, bySymptom: Record<string, number>): SymptomLinkSeed[] {
  return Object.entries(bySymptom).map(([symptom, p]) => ({ symptom, cause, p }));
}

/** Check links written check-first: P(check fails | cause); a cause may be a component or system node. */
export function bearsOn(check: string, byCause: Record<string, number>): CheckLinkSeed[] {
  return Object.entries(byCause).map(([cause, pFail]) => ({ check, cause, pFail }));
}

/**
 * Check links with graded figures for a measurement: P(well within / near / beyond / far beyond
 * the limit | cause), four starter estimates adding up to 1. The link's P(fail) is the two
 * failing bands together, so pass/fail findings keep their meaning.
 */
export function gradedOn(check: string, byCause: Record<string, BandFigures>): CheckLinkSeed[] {
  return Object.entries(byCause).map(([cause, graded]) => ({ check, cause, pFail: Math.round((graded.beyond + graded.far_beyond) * 1e9) / 1e9, graded }));
}

/** Concatenates the per-system parts into one knowledge base. */
export function mergeParts(...parts: KnowledgeBaseSeed[]): KnowledgeBaseSeed {
  return {
    symptoms: parts.flatMap((p) => p.symptoms),
    causes: parts.flatMap((p) => p.causes),
    checks: parts.flatMap((p) => p.checks),
    symptomLinks: parts.flatMap((p) => p.symptomLinks),
    checkLinks: parts.flatMap((p) => p.checkLinks),
  };
}

/** Applicability shorthands used across the files. */
export const COMBUSTION: Applicability["fuel"] = ["petrol", "diesel", "hybrid", "lpg"];
export const SPARK_IGNITION: Applicability["fuel"] = ["petrol", "hybrid", "lpg"];
export const DIESEL_ONLY: Applicability["fuel"] = ["diesel"];


/**
 * Safety wording shared by the checks. Each phrase goes with a caution from CAUTIONS (named in
 * brackets) and always sends the technician to the vehicle maker's procedure.
 */
export const SAY = {
  // lifting
  LIFT: "Follow the vehicle maker's procedure for lifting: marked lifting points only, ramp locks engaged or axle stands under a jacked car; never work under a car held only by a jack.",
  // exhaust_fumes
  FUMES: "Follow the vehicle maker's procedure; run the engine only with exhaust extraction connected or outdoors.",
  // exhaust_fumes + rotating_parts
  RUNNING: "Follow the vehicle maker's procedure; run the engine only with exhaust extraction connected, and keep hands, hair, sleeves and leads clear of the belt and fan.",
  // hot_parts
  HOT_EXHAUST: "Follow the vehicle maker's procedure; exhaust parts stay hot enough to burn long after the engine stops: let them cool and wear gloves.",
  // pressurised_cooling + hot_parts
  CAP: "Follow the vehicle maker's procedure; never open the pressure cap on a hot engine, scalding coolant can spray out. Wait until the top hose is cool to the touch.",
  // brake_hydraulics
  BRAKE_FLUID: "Follow the vehicle maker's procedure for brake hydraulics: brake fluid harms eyes, skin and paint, so wear glasses and gloves; a system that has been opened must be bled and tested before the car moves.",
  // fuel
  FUEL: "Follow the vehicle maker's procedure for fuel work: no smoking, sparks or naked lights, a fire extinguisher to hand, good ventilation; relieve the pressure before opening any fuel line and catch spilt fuel.",
  // battery_acid
  BATTERY: "Follow the vehicle maker's procedure for battery work: glasses and gloves (battery acid), no sparks or flames near the battery, and if a lead must come off, the negative comes off first and goes back last.",
  // airbag
  AIRBAG: "Follow the vehicle maker's procedure for airbags: ignition off, battery disconnected and the maker's waiting time passed before any airbag, clock-spring or seat plug is touched; never probe airbag circuits with a meter or test lamp.",
  // high_voltage
  HV: "On hybrid and electric cars only trained and authorised people work near the orange high-voltage cables and parts, following the maker's procedure.",
} as const;

/**
 * A stored trouble code as a symptom: named "P0420 stored: …", with the bare code and the usual
 * ways of typing it ("P 0420", "P-0420", "code P0420"; search ignores case) among the synonyms. Only generic codes
 * (SAE J2012 / ISO 15031-6, second character 0) belong in the starter base.
 */
export function troubleCode(code: string, title: string, system: System, extra: string[], leak = 0.02): SymptomSeed {
  const upper = code.toUpperCase();
  const [letter, digits] = [upper.slice(0, 1), upper.slice(1)];
  return {
    key: `dtc_${upper.toLowerCase()}`,
    name: `${upper} stored: ${title}`,
    synonyms: [upper, `${letter} ${digits}`, `${letter}-${digits}`, `code ${upper}`, `${upper} fault code`, ...extra],
    system,
    kind: "trouble_code",
    code: upper,
    conditions: ["in the fault memory"],
    leak,
  };
}
