// Defaults and option checks shared by ranking, planning and what-if.
import { fail } from "./errors";
import { SKILL_LEVELS, type Skill } from "./schema";

/**
 * Prior of "not in the knowledge base": 5%. A modelling choice, not a measured figure: it keeps
 * the engine from being certain of a listed cause when the evidence fits none of them well.
 * Tune it from closed cases whose confirmed cause was outside the knowledge base.
 */
export const DEFAULT_UNLISTED_PRIOR = 0.05;

/**
 * Weight of an owner's report against a technician's: 0.7. A modelling choice, not a measured
 * figure. With reliability r an owner report uses P'(e|c) = r·P(e|c) + (1 − r)·P(e), where P(e) is
 * the chance of the report before any evidence — "right with probability r, otherwise as
 * uninformative as a random report". r = 1 is a technician's confirmation; r = 0 ignores the report.
 */
export const DEFAULT_OWNER_RELIABILITY = 0.7;

/**
 * P(a symptom is present | the fault is not in the knowledge base), ρ, used as max(leak, ρ): 0.04.
 * Calibrated on the diagnostic benchmark (tests/bench/diagnosis): it puts "not in the knowledge
 * base" first or second on at least 80 % of the cases whose cause the base lacks, history only and
 * with findings, while the listed cases' top-1 and top-3 with findings stay as they were and their
 * history-only top-1 loses two cases (docs/reasoning.md has the sweep). A modelling
 * choice, not a measured figure: with the leak alone (ρ = 0) an unknown fault could never explain
 * a symptom better than an unrelated listed cause.
 */
export const DEFAULT_UNLISTED_SYMPTOM_RATE = 0.04;

/** Skill assumed for a check that does not state one: a middle level, so apprentices never get it by default. */
export const DEFAULT_CHECK_SKILL: Skill = "technician";

export type RankOptions = {
  unlistedPrior?: number; // [0, 1): 0 means "the answer is certainly one of the listed causes"
  ownerReliability?: number; // [0, 1]
  unlistedSymptomRate?: number; // [0, 1]: P(symptom | not in the knowledge base) is at least this
};

export type PlanOptions = RankOptions & { maxSkill?: Skill }; // absent: "senior" (no gating)

export type ResolvedOptions = {
  unlistedPrior: number;
  ownerReliability: number;
  unlistedSymptomRate: number;
  maxSkill: number;
};

export function skillRank(skill: Skill | undefined, what: string): number {
  const rank = SKILL_LEVELS.indexOf(skill ?? DEFAULT_CHECK_SKILL);
  if (rank < 0)
    fail("INVALID_OPTION", `${what} is "${String(skill)}"; use apprentice, technician or senior.`);
  return rank;
}

export function resolveOptions(options: PlanOptions | undefined): ResolvedOptions {
  const unlistedPrior = options?.unlistedPrior ?? DEFAULT_UNLISTED_PRIOR;
  if (typeof unlistedPrior !== "number" || !(unlistedPrior >= 0 && unlistedPrior < 1)) {
    fail("INVALID_OPTION", `unlistedPrior is ${String(unlistedPrior)}; it must be at least 0 and below 1.`);
  }
  const ownerReliability = options?.ownerReliability ?? DEFAULT_OWNER_RELIABILITY;
  if (typeof ownerReliability !== "number" || !(ownerReliability >= 0 && ownerReliability <= 1)) {
    fail("INVALID_OPTION", `ownerReliability is ${String(ownerReliability)}; it must be between 0 and 1.`);
  }
  const unlistedSymptomRate = options?.unlistedSymptomRate ?? DEFAULT_UNLISTED_SYMPTOM_RATE;
  if (typeof unlistedSymptomRate !== "number" || !(unlistedSymptomRate >= 0 && unlistedSymptomRate <= 1)) {
    fail(
      "INVALID_OPTION",
      `unlistedSymptomRate is ${String(unlistedSymptomRate)}; it must be between 0 and 1.`,
    );
  }
  const maxSkill = skillRank(options?.maxSkill ?? "senior", "maxSkill");
  return { unlistedPrior, ownerReliability, unlistedSymptomRate, maxSkill };
}
