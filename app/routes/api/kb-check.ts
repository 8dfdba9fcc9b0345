import { api } from "~/http/api.server";
import { methodNotAllowed } from "~/http/errors.server";
import { dbContext } from "~/http/context";
import { checkDetails } from "~/kb/knowledge.server";
import type { Route } from "./+types/kb-check";

// GET /api/kb/checks/:checkId — one check of the workshop's knowledge base as a technician reads
// it: steps, tools, cautions, what a fail means. The check plan sends the steps of its first few
// checks only, and fetches these when a folded check is opened.
export async function loader({ request, params, context }: Route.LoaderArgs) {
  const db = context.get(dbContext);
  return api(request, db, "kb:read", async (member) => checkDetails(db, member.workshopId, params.checkId));
}

export const action = methodNotAllowed("GET", "This address is read with GET.");
