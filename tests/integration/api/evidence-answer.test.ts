// One round trip per piece of evidence: the answer to a POST or DELETE carries the case and its new
// diagnosis, and it is exactly what GET /api/cases/:caseId says right after.
import { describe, expect, it } from "vitest";
import { loader as caseLoader } from "~/routes/api/case";
import { action as findingsAction } from "~/routes/api/findings";
import { action as observationsAction } from "~/routes/api/observations";
import { testDb } from "../../setup/integration-worker";
import { checkId, cookieFor, freshCase, request, run, symptomId } from "./helpers";

async function read(id: string, cookie: string) {
  return (await run(caseLoader, testDb(), request(`/api/cases/${id}`, { cookie }), { caseId: id })).body;
}

// Dates come back as ISO strings either way; compare the JSON.
const same = (a: unknown, b: unknown) =>
  expect(JSON.parse(JSON.stringify(a))).toEqual(JSON.parse(JSON.stringify(b)));

describe("the answer to a change is the case as it now stands", () => {
  it("after an observation, a changed observation, a finding, a reading and two removals", async () => {
    const cookie = await cookieFor(testDb(), "priya-hale");
    const id = await freshCase(testDb());
    const post = (kind: "observations" | "findings", json: unknown) =>
      run(
        kind === "findings" ? findingsAction : observationsAction,
        testDb(),
        request(`/api/cases/${id}/${kind}`, { cookie, json }),
        { caseId: id },
      );
    const del = (kind: "observations" | "findings", itemId: string) =>
      run(
        kind === "findings" ? findingsAction : observationsAction,
        testDb(),
        request(`/api/cases/${id}/${kind}/${itemId}`, { cookie, method: "DELETE" }),
        { caseId: id, itemId },
      );

    const steps = [
      () =>
        post("observations", { symptomId: symptomId("vibration_braking"), present: true, source: "owner" }),
      () => post("observations", { symptomId: symptomId("vibration_braking"), present: false }), // the same symptom, answered again
      () => post("observations", { symptomId: symptomId("squeal_braking"), present: true }),
      () => post("findings", { checkId: checkId("brake_road_test"), result: "fail" }),
      () => post("findings", { checkId: checkId("disc_runout_dial_gauge"), reading: "0.11 mm" }),
    ];
    const ids: { kind: "observations" | "findings"; id: string }[] = [];
    for (const [i, step] of steps.entries()) {
      const a = await step();
      expect(a.status, `step ${i}`).toBe(201);
      same(a.body.view, await read(id, cookie));
      ids.push({ kind: i < 3 ? "observations" : "findings", id: a.body.id as string });
    }
    for (const gone of [ids[2], ids[3]]) {
      const a = await del(gone.kind, gone.id);
      expect(a.status).toBe(200);
      same(a.body.view, await read(id, cookie));
    }
  });
});
