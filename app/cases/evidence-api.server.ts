import type { RouterContextProvider } from "react-router";
import { dbContext } from "~/http/context";
import { api, jsonBody } from "~/http/api.server";
import { refuse } from "~/http/errors.server";
import { FindingBody, ObservationBody } from "./api-schemas";
import { loadCase } from "./case.server";
import { caseView } from "./diagnosis.server";
import {
  assertCanWork,
  recordFinding,
  recordObservation,
  removeFinding,
  removeObservation,
  withEvidence,
} from "./evidence.server";

type Args = {
  request: Request;
  params: { caseId: string; itemId?: string };
  context: Readonly<RouterContextProvider>;
};

// Observations and findings are handled alike: POST adds one, DELETE on its id removes it.
const KINDS = {
  observations: {
    body: ObservationBody,
    add: recordObservation,
    remove: removeObservation,
    noun: "an observation",
  },
  findings: { body: FindingBody, add: recordFinding, remove: removeFinding, noun: "a finding" },
} as const;

/**
 * One round trip per piece of evidence: the answer carries the case and its new diagnosis in the
 * shape GET /api/cases/:caseId returns, so the browser shows the re-ranked causes without asking
 * again. The case is read once, with what its ranking needs, and the change applied to that copy.
 */
export function evidenceAction({ request, params, context }: Args, kind: keyof typeof KINDS) {
  const db = context.get(dbContext);
  const k = KINDS[kind];
  return api(request, db, null, async (member) => {
    const bundle = await loadCase(db, member, params.caseId);
    assertCanWork(member, bundle); // before the body is read: a refused role learns nothing from validation
    // A finding's answer also says how its reading was judged.
    const answer = async (next: typeof bundle, status: number, added?: { id: string; result?: string }) => {
      const head = added ? { id: added.id, ...(added.result ? { result: added.result } : {}) } : {};
      return Response.json({ ...head, view: await caseView(db, member, next) }, { status });
    };
    if (request.method === "POST" && !params.itemId) {
      const body = await jsonBody(request, k.body as typeof ObservationBody & typeof FindingBody);
      const added = await k.add(db, member, bundle, body);
      return answer(withEvidence(bundle, { added }), 201, added);
    }
    if (request.method === "DELETE" && params.itemId) {
      await k.remove(db, member, bundle, params.itemId);
      return answer(withEvidence(bundle, { removed: params.itemId }), 200);
    }
    refuse(405, `Use POST to add ${k.noun} and DELETE on its id to remove it.`);
  });
}

export const readWithCase = () =>
  Response.json({ error: "Read evidence with GET /api/cases/:caseId." }, { status: 405 });
