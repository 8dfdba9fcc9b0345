import { evidenceAction, readWithCase } from "~/cases/evidence-api.server";
import type { Route } from "./+types/findings";

// POST /api/cases/:caseId/findings — pass/fail, or a reading judged by the check's rule; DELETE …/findings/:itemId.
export const action = (args: Route.ActionArgs) => evidenceAction(args, "findings");
export const loader = readWithCase;
