// Shapes and small builders for the diagnostic benchmark: invented workshop cases, each with the
// vehicle's facts, what people said or typed (and which symptom they meant), what was measured,
// and the known answer. Phrases are written the way owners and technicians talk, not copied from
// the knowledge base; a unit test checks that none equals a knowledge-base name or synonym.
import type { System } from "../../../seeds/kb/types";

export type Vehicle = {
  fuel: "petrol" | "diesel" | "hybrid" | "electric" | "lpg";
  drivetrain: "fwd" | "rwd" | "awd";
  ageYears: number;
  km: number;
};

/**
 * One thing typed into Quick find. `means` is the symptom key the person meant (null: nothing in
 * the knowledge base fits, so the right answer is "no good match"); `present` is whether they meant
 * it as there (true) or not there (false, e.g. "no grinding").
 */
export type Phrase = { text: string; by: "owner" | "technician"; means: string | null; present: boolean };

/** A check's result as recorded: pass/fail, or a reading with its unit (graded against the rule). */
export type CaseFinding = { check: string; result?: "pass" | "fail"; reading?: string };

/** The known answer: a failure-mode key, or a plausible fault the knowledge base does not hold. */
export type Answer = { cause: string } | { missing: string };

export type BenchCase = {
  id: string;
  system: System;
  vehicle: Vehicle;
  said: Phrase[];
  findings: CaseFinding[];
  answer: Answer;
};

export const owner = (text: string, means: string | null, present = true): Phrase => ({
  text,
  by: "owner",
  means,
  present,
});
export const tech = (text: string, means: string | null, present = true): Phrase => ({
  text,
  by: "technician",
  means,
  present,
});
export const pass = (check: string): CaseFinding => ({ check, result: "pass" });
export const fail = (check: string): CaseFinding => ({ check, result: "fail" });
export const read = (check: string, reading: string): CaseFinding => ({ check, reading });
export const cause = (key: string): Answer => ({ cause: key });
export const missing = (fault: string): Answer => ({ missing: fault });

// Vehicle shorthands: fuel, drivetrain, age in years, distance in km.
export const car = (
  fuel: Vehicle["fuel"],
  drivetrain: Vehicle["drivetrain"],
  ageYears: number,
  km: number,
): Vehicle => ({ fuel, drivetrain, ageYears, km });

export function bench(
  id: string,
  system: System,
  vehicle: Vehicle,
  said: Phrase[],
  findings: CaseFinding[],
  answer: Answer,
): BenchCase {
  return { id, system, vehicle, said, findings, answer };
}
