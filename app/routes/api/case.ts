import { methodNotAllowed } from "~/http/errors.server";
import { api } from "~/http/api.server";
import { loadCase } from "~/cases/case.server";
import { caseView } from "~/cases/diagnosis.server";
import { dbContext } from "~/http/context";
import type { Route } from "./+types/case";

// GET /api/cases/:caseId — the case with its evidence, likely causes and check plan.
export async function loader({ request, params, context }: Route.LoaderArgs) {
  const db = context.get(dbContext);
  return api(request, db, "case:read", async (member) => {
    return caseView(db, member, await loadCase(db, member, params.caseId));
  });
}

export const action = methodNotAllowed("GET", "This address is read with GET.");
