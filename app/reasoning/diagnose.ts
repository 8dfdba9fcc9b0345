// diagnose: ranking and plan from one index and one posterior — what a case screen needs in a
// single call, without indexing the model twice.
import { resolveEvidence } from "./evidence";
import { toCompiled, type CompiledModel } from "./compiled";
import { resolveOptions, type PlanOptions } from "./options";
import { planFrom, type Plan } from "./plan";
import { computePosterior } from "./posterior";
import { rankFrom, type Ranking } from "./rank";
import type { Evidence, Model } from "./schema";

export function diagnose(
  model: Model | CompiledModel,
  evidence: Evidence,
  options?: PlanOptions,
): { ranking: Ranking; plan: Plan } {
  const opts = resolveOptions(options);
  const compiled = toCompiled(model);
  const index = compiled.scoped(opts.unlistedPrior);
  const items = resolveEvidence(index, evidence, opts.ownerReliability, opts.unlistedSymptomRate);
  const post = computePosterior(index, items);
  return {
    ranking: rankFrom(compiled, index, items, post),
    plan: planFrom(compiled, index, evidence, post, opts.maxSkill),
  };
}
