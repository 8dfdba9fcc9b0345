import { methodNotAllowed } from "~/http.server";
import { z } from "zod";
import { api, jsonBody } from "~/api.server";
import { dbContext } from "~/context";
import { EvidenceSchema, ModelSchema, planChecks, rankCauses, SkillSchema, whatIf } from "~/reasoning";
import type { Route } from "./+types/what-if";

const Body = z.object({
  model: ModelSchema,
  evidence: EvidenceSchema,
  checkId: z.string().min(1).optional(),
  options: z.object({ unlistedPrior: z.number().min(0).max(0.99).optional(), maxSkill: SkillSchema.optional() }).default({}),
});

// POST /api/what-if — stateless: rank and plan any model and evidence (the reasoning core's schemas).
// Nothing is stored; it exists so a senior can try a knowledge-base change before making it.
export async function action({ request, context }: Route.ActionArgs) {
  return api(request, context.get(dbContext), "case:read", async () => {
    const { model, evidence, checkId, options } = await jsonBody(request, Body);
    if (model.causes.length * 4 + model.links.length + model.checks.length > 200_000) {
      return Response.json({ error: "That model is too large for the what-if endpoint." }, { status: 413 });
    }
    return { ranking: rankCauses(model, evidence, options), plan: planChecks(model, evidence, options), whatIf: checkId ? whatIf(model, evidence, checkId, options) : null };
  });
}

export const loader = methodNotAllowed("POST", "Send a model and evidence with POST.");
