import type { RouterContextProvider } from "react-router";
import { api, jsonBody } from "~/http/api.server";
import { dbContext } from "~/http/context";
import { refuse } from "~/http/errors.server";
import { FindingBody, ObservationBody } from "./api-schemas";
import { loadCaseForChange } from "./case.server";
import { assertCanWork, recordFinding, recordObservation, removeFinding, removeObservation } from "./evidence.server";

type Args = { request: Request; params: { caseId: string; itemId?: string }; context: Readonly<RouterContextProvider> };

// Observations and findings are handled alike: POST adds one, DELETE on its id removes it.
const KINDS = {
  observations: { body: ObservationBody, add: recordObservation, remove: removeObservation, noun: "an observation" },
  findings: { body: FindingBody, add: recordFinding, remove: removeFinding, noun: "a finding" },
} as const;

export function evidenceAction({ request, params, context }: Args, kind: keyof typeof KINDS) {
  const db = context.get(dbContext);
  const k = KINDS[kind];
  return api(request, db, null, async (member) => {
    const bundle = await loadCaseForChange(db, member, params.caseId);
    assertCanWork(member, bundle); // before the body is read: a refused role learns nothing from validation
    if (request.method === "POST" && !params.itemId) {
      const body = await jsonBody(request, k.body as typeof ObservationBody & typeof FindingBody);
      return Response.json(await k.add(db, member, bundle, body), { status: 201 });
    }
    if (request.method === "DELETE" && params.itemId) {
      await k.remove(db, member, bundle, params.itemId);
      return new Response(null, { status: 204 });
    }
    refuse(405, `Use POST to add ${k.noun} and DELETE on its id to remove it.`);
  });
}

export const readWithCase = () => Response.json({ error: "Read evidence with GET /api/cases/:caseId." }, { status: 405 });
