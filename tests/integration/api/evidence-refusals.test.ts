// POST /api/cases/:caseId/observations|findings refused for bad input or a case that is not open;
// after every refusal the case's evidence and the audit log are exactly as before.
import { randomUUID } from "node:crypto";
import { beforeAll, describe, expect, it } from "vitest";
import { action as findingsAction } from "~/routes/api/findings";
import { action as observationsAction } from "~/routes/api/observations";
import { seedId } from "../../../seeds/ids";
import { kbId } from "../../../seeds/knowledge";
import { testDb } from "../../setup/integration-worker";
import {
  caseId,
  checkId,
  cookieFor,
  freshCase,
  isCleanError,
  request,
  run,
  snapshot,
  symptomId,
  type Send,
} from "./helpers";

let priya: string;
beforeAll(async () => {
  priya = await cookieFor(testDb(), "priya-hale");
});

const post = (kind: "observations" | "findings", id: string, send: Send) =>
  run(
    kind === "findings" ? findingsAction : observationsAction,
    testDb(),
    request(`/api/cases/${id}/${kind}`, { cookie: priya, ...send }),
    { caseId: id },
  );

/** Sends a request that must be refused with `status`, and checks nothing changed. */
async function refused(kind: "observations" | "findings", id: string, send: Send, status: number) {
  const before = await snapshot(testDb(), id);
  const a = await post(kind, id, send);
  expect(a.status, JSON.stringify(a.body)).toBe(status);
  expect(isCleanError(a), JSON.stringify(a.body)).toBe(true);
  expect(await snapshot(testDb(), id)).toEqual(before);
  return a;
}

describe("refused before anything is read", () => {
  it("403 for a cross-origin POST, and for one with no Origin and no same-origin fetch metadata", async () => {
    const body = { symptomId: symptomId("pedal_pulsing"), present: true };
    await refused("observations", caseId("b1"), { json: body, origin: "http://evil.example" }, 403);
    await refused("observations", caseId("b1"), { json: body, origin: null }, 403);
    await refused(
      "observations",
      caseId("b1"),
      { json: body, origin: null, headers: { "sec-fetch-site": "cross-site" } },
      403,
    );
    // The same body from our own origin is accepted (the control for the three above).
    expect((await post("observations", caseId("b1"), { json: body })).status).toBe(201);
  });

  it("400 for a body that is not JSON", async () => {
    const a = await refused("findings", caseId("b1"), { raw: "checkId=abc&result=pass" }, 400);
    expect(a.body.error).toMatch(/JSON/);
    await refused("observations", caseId("b1"), { raw: '{"symptomId":' }, 400);
  });

  it("400 for a body of the wrong shape", async () => {
    await refused(
      "observations",
      caseId("b1"),
      { json: { symptomId: "vibration_braking", present: true } },
      400,
    );
    await refused(
      "observations",
      caseId("b1"),
      { json: { symptomId: symptomId("pedal_pulsing"), present: "yes" } },
      400,
    );
    await refused("findings", caseId("b1"), { json: { checkId: checkId("brake_road_test") } }, 400);
    await refused(
      "findings",
      caseId("b1"),
      { json: { checkId: checkId("brake_road_test"), result: "maybe" } },
      400,
    );
  });
});

describe("refused against the knowledge base", () => {
  it("400 for a valid uuid that is no symptom of this workshop", async () => {
    const a = await refused(
      "observations",
      caseId("b1"),
      { json: { symptomId: randomUUID(), present: true } },
      400,
    );
    expect(a.body.error).toMatch(/symptom/i);
  });

  it("400 for a symptom of another workshop's knowledge base", async () => {
    const saltmarshSymptom = kbId("saltmarsh", "symptom", "vibration_braking");
    await refused(
      "observations",
      caseId("b1"),
      { json: { symptomId: saltmarshSymptom, present: true } },
      400,
    );
  });

  it("400 for a valid uuid that is no check", async () => {
    const a = await refused(
      "findings",
      caseId("b1"),
      { json: { checkId: randomUUID(), result: "pass" } },
      400,
    );
    expect(a.body.error).toMatch(/check/i);
  });
});

describe("measurement findings (the run-out check's rule is `value <= 0.05 mm`, seeds/kb/brakes.ts)", () => {
  const runout = checkId("disc_runout_dial_gauge");

  it("400 for a pressure where a length is needed, naming both", async () => {
    const a = await refused("findings", caseId("b1"), { json: { checkId: runout, reading: "5 kPa" } }, 400);
    expect(a.body.error).toMatch(/kPa/);
    expect(a.body.error).toMatch(/length/i);
    expect(a.body.code).toBe("UNIT_MISMATCH");
  });

  it("400 for a reading that does not parse, and for one with no unit", async () => {
    await refused("findings", caseId("b1"), { json: { checkId: runout, reading: "abc" } }, 400);
    await refused("findings", caseId("b1"), { json: { checkId: runout, reading: "0.03" } }, 400);
    await refused("findings", caseId("b1"), { json: { checkId: runout, reading: "0,03 mm" } }, 400);
    await refused("findings", caseId("b1"), { json: { checkId: runout, result: "pass" } }, 400); // a measured check needs its reading
  });
});

describe("one finding per check", () => {
  it("409 for a second finding of a check already recorded, whatever its result", async () => {
    const id = await freshCase(testDb());
    const first = await post("findings", id, {
      json: { checkId: checkId("brake_road_test"), result: "fail" },
    });
    expect(first.status).toBe(201);
    const a = await refused(
      "findings",
      id,
      { json: { checkId: checkId("brake_road_test"), result: "pass" } },
      409,
    );
    expect(a.body.error).toMatch(/already/);
    await refused("findings", id, { json: { checkId: checkId("brake_road_test"), result: "fail" } }, 409);
  });

  it("a second observation of a symptom changes the first instead of adding a twin", async () => {
    const id = await freshCase(testDb());
    const a = await post("observations", id, {
      json: { symptomId: symptomId("squeal_braking"), present: true, source: "owner" },
    });
    const b = await post("observations", id, {
      json: { symptomId: symptomId("squeal_braking"), present: false },
    });
    expect([a.status, b.status]).toEqual([201, 201]);
    expect(b.body.id).toBe(a.body.id);
    expect((await snapshot(testDb(), id)).observations).toBe(1);
  });
});

describe("a case that is not open", () => {
  // b5 is closed and b4 concluded (seeds/demo/cases.ts): their evidence is fixed.
  it("409 for evidence on a closed case", async () => {
    const a = await refused(
      "findings",
      caseId("b5"),
      { json: { checkId: checkId("brake_road_test"), result: "fail" } },
      409,
    );
    expect(a.body.error).toMatch(/no longer open/);
    await refused(
      "observations",
      caseId("b5"),
      { json: { symptomId: symptomId("pedal_pulsing"), present: true } },
      409,
    );
  });

  it("409 for evidence on a concluded case", async () => {
    await refused(
      "observations",
      caseId("b4"),
      { json: { symptomId: symptomId("pedal_pulsing"), present: true } },
      409,
    );
  });

  it("409 for removing evidence from a closed case", async () => {
    const seeded = seedId("finding:b5:disc_runout_dial_gauge"); // the seed's id scheme (seeds/demo.ts)
    const before = await snapshot(testDb(), caseId("b5"));
    const a = await run(
      findingsAction,
      testDb(),
      request(`/api/cases/${caseId("b5")}/findings/${seeded}`, { cookie: priya, method: "DELETE" }),
      { caseId: caseId("b5"), itemId: seeded },
    );
    expect(a.status).toBe(409);
    expect(await snapshot(testDb(), caseId("b5"))).toEqual(before);
  });
});
