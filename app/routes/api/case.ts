import { methodNotAllowed } from "~/http/errors.server";
import { api } from "~/http/api.server";
import { caseFields, loadCase } from "~/cases/case.server";
import { diagnoseCase } from "~/cases/diagnosis.server";
import { dbContext } from "~/http/context";
import type { Route } from "./+types/case";

// GET /api/cases/:caseId — the case with its evidence, likely causes and check plan.
export async function loader({ request, params, context }: Route.LoaderArgs) {
  const db = context.get(dbContext);
  return api(request, db, "case:read", async (member) => {
    const bundle = await loadCase(db, member, params.caseId);
    const { model: _model, evidence: _evidence, ...diagnosis } = await diagnoseCase(db, member, bundle);
    return { case: caseFields(bundle), diagnosis };
  });
}

export const action = methodNotAllowed("GET", "This address is read with GET.");
