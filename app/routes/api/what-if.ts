import { methodNotAllowed, refuse } from "~/http/errors.server";
import { z } from "zod";
import { api, jsonBody } from "~/http/api.server";
import { dbContext } from "~/http/context";
import {
  compileModel,
  EvidenceSchema,
  ModelSchema,
  planChecks,
  rankCauses,
  SkillSchema,
  whatIf,
} from "~/reasoning";
import type { Route } from "./+types/what-if";

const Body = z.object({
  model: ModelSchema,
  evidence: EvidenceSchema,
  checkId: z.string().min(1).optional(),
  options: z
    .object({ unlistedPrior: z.number().min(0).max(0.99).optional(), maxSkill: SkillSchema.optional() })
    .default({}),
});

/**
 * What a what-if may hold: ten times a whole workshop's knowledge base (the starter base has about
 * 250 causes, 200 checks and 800 links), so any screen's question fits and no request can hold the
 * server for long. With these caps the worst case (ranked, planned and asked what-if) stays well
 * under 100 ms of work on one core; `npm run bench` prints it. The body itself is capped at 1 MB
 * before it is read (app/http/body-rules.ts).
 */
export const WHAT_IF_LIMITS = {
  causes: 2_500,
  symptoms: 2_500,
  links: 25_000,
  checks: 2_500,
  bearings: 25_000,
  evidence: 500,
} as const;

// POST /api/what-if — stateless: rank and plan any model and evidence (the reasoning core's schemas).
// Nothing is stored; it exists so a senior can try a knowledge-base change before making it.
export async function action({ request, context }: Route.ActionArgs) {
  return api(request, context.get(dbContext), "case:read", async () => {
    const { model, evidence, checkId, options } = await jsonBody(request, Body);
    const sizes = {
      causes: model.causes.length,
      symptoms: model.symptoms.length,
      links: model.links.length,
      checks: model.checks.length,
      bearings: model.checks.reduce((n, k) => n + k.bears.length, 0),
      evidence: evidence.observations.length + evidence.findings.length,
    };
    for (const [what, limit] of Object.entries(WHAT_IF_LIMITS)) {
      const n = sizes[what as keyof typeof sizes];
      if (n > limit)
        refuse(
          413,
          `That what-if has ${n.toLocaleString("en-GB")} ${what}; it takes at most ${limit.toLocaleString("en-GB")}.`,
          { limit: { [what]: limit } },
        );
    }
    // Compiled once for the three questions: compiling is the largest part of each.
    const compiled = compileModel(model);
    return {
      ranking: rankCauses(compiled, evidence, options),
      plan: planChecks(compiled, evidence, options),
      whatIf: checkId ? whatIf(compiled, evidence, checkId, options) : null,
    };
  });
}

export const loader = methodNotAllowed("POST", "Send a model and evidence with POST.");
