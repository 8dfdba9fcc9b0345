// Public surface of the reasoning core: pure functions over a Model already resolved for one
// vehicle. No database, no I/O.
export {
  ModelSchema,
  EvidenceSchema,
  SkillSchema,
  SKILL_LEVELS,
  ConditionSchema,
  ReadingBandSchema,
  parseModel,
  parseEvidence,
} from "./schema";
export type { Model, Evidence, Cause, Symptom, Link, Check, Observation, Finding, Skill } from "./schema";
export { ReasoningError, REASONING_ERROR_CODES } from "./errors";
export type { ReasoningErrorCode } from "./errors";
export {
  DEFAULT_UNLISTED_PRIOR,
  DEFAULT_OWNER_RELIABILITY,
  DEFAULT_CHECK_SKILL,
  DEFAULT_UNLISTED_SYMPTOM_RATE,
} from "./options";
export type { RankOptions, PlanOptions } from "./options";
export { rankCauses, RankedCause } from "./rank";
export type { Ranking } from "./rank";
export { planChecks, orderCost } from "./plan";
export type { Plan, PlanStep, AboveSkillStep } from "./plan";
export { whatIf } from "./what-if";
export type { WhatIf, WhatIfOutcome } from "./what-if";
export { diagnose } from "./diagnose";
export { rankSecondFault } from "./second-fault";
export type { SecondFault } from "./second-fault";
export {
  CONDITIONS,
  CONDITION_ANY,
  CONDITION_MATCH,
  CONDITION_MISS,
  SPEED_BANDS_KMH,
  speedBand,
} from "./conditions";
export type { Condition } from "./conditions";
export { READING_BANDS, FAULT_BAND_SHARE, SOUND_BAND_SHARE } from "./bands";
export type { ReadingBand, BandFigures } from "./bands";
export { compileModel, CompiledModel } from "./compiled";
export { resolvePriors, DEFAULT_PSEUDO_COUNT, DEFAULT_YOUNG_FACTOR } from "./priors";
export type { Applicability, PriorInput, VehicleFacts, PriorOptions, ResolvedPrior } from "./priors";
export { checkCost } from "./cost";
export type { CheckCostInput } from "./cost";
