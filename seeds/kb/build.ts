// Small builders so the per-system files read like a senior's notes rather than boilerplate.
// They only fill in the repetitive fields; every value a curator cares about stays in the
// system files.

import type {
  Applicability,
  CauseSeed,
  CheckLinkSeed,
  KnowledgeBaseSeed,
  Priority,
  SymptomLinkSeed,
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

