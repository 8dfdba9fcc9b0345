import { api } from "~/http/api.server";
import { methodNotAllowed } from "~/http/errors.server";
import { loadCaseHistory } from "~/cases/case.server";
import { dbContext } from "~/http/context";
import type { Route } from "./+types/history";

// GET /api/cases/:caseId/history — the case's latest history rows, newest first; the case page
// fetches them when History is opened instead of carrying them in every page.
export async function loader({ request, params, context }: Route.LoaderArgs) {
  const db = context.get(dbContext);
  return api(request, db, "case:read", async (member) => ({
    history: await loadCaseHistory(db, member, params.caseId),
  }));
}

export const action = methodNotAllowed("GET", "This address is read with GET.");
