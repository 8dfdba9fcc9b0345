import { methodNotAllowed } from "~/http/errors.server";
import { api } from "~/http/api.server";
import { loadCase } from "~/cases/case.server";
import { diagnoseCase } from "~/cases/diagnosis.server";
import { dbContext } from "~/http/context";
import type { Route } from "./+types/diagnosis";

// GET /api/cases/:caseId/diagnosis — only the ranking and plan, for the live re-rank.
export async function loader({ request, params, context }: Route.LoaderArgs) {
  const db = context.get(dbContext);
  return api(request, db, "case:read", async (member) => {
    const bundle = await loadCase(db, member, params.caseId);
    const { model: _model, evidence, ...diagnosis } = await diagnoseCase(db, member, bundle);
    return { evidence, ...diagnosis };
  });
}

export const action = methodNotAllowed("GET", "This address is read with GET.");
