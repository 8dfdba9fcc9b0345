// The shapes the reasoning core accepts, as zod schemas so the server can check untrusted input
// at its boundary. The core re-checks ranges and cross-references itself (fast, typed errors),
// so a Model built in code is as safe as one parsed here.
import { z } from "zod";
import { SKILLS } from "~/domain/people";
import { READING_BANDS } from "./bands";
import { CONDITIONS } from "./conditions";
import { ReasoningError } from "./errors";

/** The domain's skill levels, lowest first (app/domain/people.ts). */
export const SKILL_LEVELS = SKILLS;
export const SkillSchema = z.enum(SKILL_LEVELS);
export type Skill = z.infer<typeof SkillSchema>;

const id = z.string().min(1);
const probability = z.number().min(0).max(1);
export const ConditionSchema = z.enum(CONDITIONS);
export const ReadingBandSchema = z.enum(READING_BANDS);
// P(reading in each band | cause), summing to 1: how far a measurement misses when this cause is there.
const bandFigures = z.object({
  well_within: probability,
  near: probability,
  beyond: probability,
  far_beyond: probability,
});

export const CauseSchema = z.object({
  id,
  parentId: id.nullish(), // null/absent: a root of the cause tree
  prior: z.number().min(0), // relative base rate; only leaves' priors are used
  name: z.string().optional(),
});

export const SymptomSchema = z.object({
  id,
  leak: probability, // P(symptom | no listed cause)
  name: z.string().optional(),
  // P(symptom | the fault is not in the knowledge base), where a curator knows better than the
  // default max(leak, unlistedSymptomRate): a code the base does not list points outside it.
  unlisted: probability.optional(),
});

export const LinkSchema = z.object({
  symptomId: id,
  causeId: id,
  p: probability, // P(symptom | cause)
  // The conditions under which this cause shows the symptom (absent: any); see docs/reasoning.md.
  when: z.array(ConditionSchema).optional(),
});

export const CheckSchema = z.object({
  id,
  cost: z.number().positive(),
  falseAlarm: probability, // P(check fails | none of the causes it bears on)
  name: z.string().optional(),
  skill: SkillSchema.optional(), // absent: "technician"
  // causeId may be an inner node; graded (optional) gives P(band | cause) for a measured reading.
  bears: z.array(z.object({ causeId: id, pFail: probability, graded: bandFigures.optional() })),
});

export const ModelSchema = z.object({
  causes: z.array(CauseSchema),
  symptoms: z.array(SymptomSchema),
  links: z.array(LinkSchema),
  checks: z.array(CheckSchema),
});

export const ObservationSchema = z.object({
  symptomId: id,
  present: z.boolean(),
  source: z.enum(["owner", "technician"]).optional(), // absent: "technician"
  conditions: z.array(ConditionSchema).optional(), // what it was seen under: "judder when braking from speed"
});

export const FindingSchema = z.object({
  checkId: id,
  result: z.enum(["pass", "fail"]),
  band: ReadingBandSchema.optional(), // a measured reading's band (app/measure gradeReading); must agree with result
});

export const EvidenceSchema = z.object({
  observations: z.array(ObservationSchema),
  findings: z.array(FindingSchema),
});

export type Cause = z.infer<typeof CauseSchema>;
export type Symptom = z.infer<typeof SymptomSchema>;
export type Link = z.infer<typeof LinkSchema>;
export type Check = z.infer<typeof CheckSchema>;
export type Model = z.infer<typeof ModelSchema>;
export type Observation = z.infer<typeof ObservationSchema>;
export type Finding = z.infer<typeof FindingSchema>;
export type Evidence = z.infer<typeof EvidenceSchema>;

function parseWith<T>(schema: z.ZodType<T>, input: unknown, what: string): T {
  const result = schema.safeParse(input);
  if (result.success) return result.data;
  const issue = result.error.issues[0];
  const at = issue.path.length ? issue.path.join(".") : "(top level)";
  throw new ReasoningError("INVALID_INPUT", `${what} at ${at}: ${issue.message}`);
}

/** Check untrusted input (e.g. JSON from a request) and return a typed Model, or throw INVALID_INPUT. */
export const parseModel = (input: unknown): Model => parseWith(ModelSchema, input, "Model");
export const parseEvidence = (input: unknown): Evidence => parseWith(EvidenceSchema, input, "Evidence");
