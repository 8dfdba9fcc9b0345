// GET /api/cases/:caseId and …/diagnosis: who gets the case, and what the refusals look like.
import { randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { checks, members } from "~/db/schema";
import { loader as caseLoader } from "~/routes/api/case";
import { loader as diagnosisLoader } from "~/routes/api/diagnosis";
import { action as findingsAction, loader as findingsLoader } from "~/routes/api/findings";
import { seedId } from "../../../seeds/ids";
import { testDb } from "../../setup/integration-worker";
import { caseId, cookieFor, freshCase, isCleanError, memberFor, request, run, symptomId } from "./helpers";

const get = async (id: string, cookie: string | null) =>
  run(caseLoader, testDb(), request(`/api/cases/${id}`, { cookie }), { caseId: id });

let priya: string;
let rowan: string;
beforeAll(async () => {
  priya = await cookieFor(testDb(), "priya-hale");
  rowan = await cookieFor(testDb(), "rowan-quill");
});

describe("GET /api/cases/:caseId", () => {
  it("answers 200 with the case, its evidence and the diagnosis", async () => {
    const a = await get(caseId("b1"), priya);
    expect(a.status).toBe(200);
    const c = a.body.case as {
      id: string;
      number: number;
      state: string;
      observations: { symptomId: string; present: boolean; source: string }[];
      findings: unknown[];
    };
    // Demo case b1 (seeds/demo/cases.ts): number 1041, open, the owner's vibration_braking report, no findings.
    expect(c).toMatchObject({ id: caseId("b1"), number: 1041, state: "open" });
    expect(c.observations.map((o) => [o.symptomId, o.present, o.source])).toEqual([
      [symptomId("vibration_braking"), true, "owner"],
    ]);
    expect(c.findings).toEqual([]);
    const d = a.body.diagnosis as {
      causes: { id: string; probability: number }[];
      otherCauses: { count: number; probability: number };
      unlisted: number;
      plan: { steps: unknown[] };
    };
    expect(d.causes.length).toBeGreaterThan(0);
    // A posterior over leaves plus "not in the knowledge base" sums to 1 (probability axiom).
    expect(
      d.causes.reduce((s, x) => s + x.probability, 0) + d.otherCauses.probability + d.unlisted,
    ).toBeCloseTo(1, 9);
    expect(d.plan.steps.length).toBeGreaterThan(0);
  });

  it("answers 401 in JSON, not a redirect, without a session cookie", async () => {
    const a = await get(caseId("b1"), null);
    expect(a.status).toBe(401);
    expect(isCleanError(a)).toBe(true);
  });

  it("answers 401 for a tampered cookie", async () => {
    const a = await get(caseId("b1"), "rl_session=not-a-token");
    expect(a.status).toBe(401);
    expect(isCleanError(a)).toBe(true);
  });

  it("answers 403 in JSON to a signed-in person with no membership, and to a suspended member", async () => {
    const newcomer = await get(caseId("b1"), await cookieFor(testDb(), "sam-newcomer"));
    expect(newcomer.status).toBe(403);
    expect(isCleanError(newcomer)).toBe(true);
    await testDb()
      .update(members)
      .set({ status: "suspended" })
      .where(eq(members.id, seedId("member:kit-arbuthnot")));
    const suspended = await get(caseId("s1"), await cookieFor(testDb(), "kit-arbuthnot"));
    expect(suspended.status).toBe(403);
    expect(suspended.body.error).toMatch(/suspended/);
  });

  it("answers 404 for a malformed id", async () => {
    for (const id of ["not-a-uuid", "1041", "' or 1=1 --"]) {
      const a = await get(id, priya);
      expect(a.status, id).toBe(404);
      expect(isCleanError(a)).toBe(true);
    }
  });

  it("answers 404 for a well-formed id that is no case", async () => {
    const a = await get(randomUUID(), priya);
    expect(a.status).toBe(404);
    expect(isCleanError(a)).toBe(true);
  });

  it("answers 404, not 403, for another workshop's case, with the same message as an unknown id", async () => {
    // Rowan is a Saltmarsh technician; b1 belongs to Bramblegate (seeds/demo/people.ts, cases.ts).
    const theirs = await get(caseId("b1"), rowan);
    const unknown = await get(randomUUID(), rowan);
    expect(theirs.status).toBe(404);
    expect(isCleanError(theirs)).toBe(true);
    expect(theirs.body).toEqual(unknown.body);
    // …while their own case s1 opens.
    expect((await get(caseId("s1"), rowan)).status).toBe(200);
  });
});

describe("GET /api/cases/:caseId/diagnosis", () => {
  it("gives the same ranking as the case endpoint, with the evidence it used", async () => {
    const whole = await get(caseId("b1"), priya);
    const d = await run(
      diagnosisLoader,
      testDb(),
      request(`/api/cases/${caseId("b1")}/diagnosis`, { cookie: priya }),
      { caseId: caseId("b1") },
    );
    expect(d.status).toBe(200);
    expect(d.body.causes).toEqual((whole.body.diagnosis as { causes: unknown }).causes);
    expect(d.body.evidence).toEqual({
      observations: [{ symptomId: symptomId("vibration_braking"), present: true, source: "owner" }],
      findings: [],
    });
  });

  it("refuses another workshop's case with 404", async () => {
    const d = await run(
      diagnosisLoader,
      testDb(),
      request(`/api/cases/${caseId("b1")}/diagnosis`, { cookie: rowan }),
      { caseId: caseId("b1") },
    );
    expect(d.status).toBe(404);
    expect(isCleanError(d)).toBe(true);
  });
});

describe("a case's findings", () => {
  it("the case view carries the latest ten and their total; GET …/findings lists every one, in order", async () => {
    const priya = await cookieFor(testDb(), "priya-hale");
    const id = await freshCase(testDb());
    const member = await memberFor(testDb(), "priya-hale");
    const ids = (
      await testDb()
        .select({ id: checks.id })
        .from(checks)
        .where(and(eq(checks.workshopId, member.workshopId), eq(checks.resultKind, "pass_fail")))
        .orderBy(checks.id)
        .limit(14)
    ).map((k) => k.id);
    for (const checkId of ids)
      await run(
        findingsAction,
        testDb(),
        request(`/api/cases/${id}/findings`, { cookie: priya, json: { checkId, result: "pass" } }),
        { caseId: id },
      );
    const view = await run(caseLoader, testDb(), request(`/api/cases/${id}`, { cookie: priya }), {
      caseId: id,
    });
    const c = view.body.case as { findings: { checkId: string }[]; findingCount: number };
    expect(c.findingCount).toBe(14);
    expect(c.findings.map((f) => f.checkId)).toEqual(ids.slice(-10));
    const all = await run(findingsLoader, testDb(), request(`/api/cases/${id}/findings`, { cookie: priya }), {
      caseId: id,
    });
    expect(all.status).toBe(200);
    expect((all.body.findings as { checkId: string }[]).map((f) => f.checkId)).toEqual(ids);
  });

  it("refuses another workshop's case with 404 and an item id with 405", async () => {
    const rowan = await cookieFor(testDb(), "rowan-quill");
    const other = await run(
      findingsLoader,
      testDb(),
      request(`/api/cases/${caseId("b1")}/findings`, { cookie: rowan }),
      { caseId: caseId("b1") },
    );
    expect(other.status).toBe(404);
    const item = await run(
      findingsLoader,
      testDb(),
      request(`/api/cases/${caseId("b1")}/findings/x`, { cookie: await cookieFor(testDb(), "priya-hale") }),
      { caseId: caseId("b1"), itemId: "x" },
    );
    expect(item.status).toBe(405);
  });
});
