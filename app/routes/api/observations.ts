import { evidenceAction, readWithCase } from "~/cases/evidence-api.server";
import type { Route } from "./+types/observations";

// POST /api/cases/:caseId/observations — add (or change) one; DELETE …/observations/:itemId — remove it.
export const action = (args: Route.ActionArgs) => evidenceAction(args, "observations");
export const loader = readWithCase;
