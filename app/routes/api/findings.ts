import { api } from "~/http/api.server";
import { loadCaseForChange } from "~/cases/case.server";
import { evidenceAction } from "~/cases/evidence-api.server";
import { dbContext } from "~/http/context";
import type { Route } from "./+types/findings";

// GET /api/cases/:caseId/findings — every finding of the case, in recording order (a case view
// carries only the latest). POST — pass/fail, or a reading judged by the check's rule; DELETE …/findings/:itemId.
export async function loader({ request, params, context }: Route.LoaderArgs) {
  const db = context.get(dbContext);
  return api(request, db, "case:read", async (member) => {
    if (params.itemId)
      return Response.json(
        { error: "Read a case's findings with GET /api/cases/:caseId/findings." },
        { status: 405 },
      );
    return { findings: (await loadCaseForChange(db, member, params.caseId)).findings };
  });
}

export const action = (args: Route.ActionArgs) => evidenceAction(args, "findings");
