// Two people on one case at once (docs/architecture.md, "Data"): evidence rows side by side lose
// nothing; a shared field written from the same version has one winner and the loser is told
// what the case says now; the same check recorded twice at once is stored once.
import { and, count, eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { loadCase } from "~/cases/case.server";
import { recordFinding } from "~/cases/evidence.server";
import { conclude, updateComplaint } from "~/cases/workflow.server";
import { createDb, type Db } from "~/db/client.server";
import { auditLog, cases, findings, observations } from "~/db/schema";
import { action as findingsAction } from "~/routes/api/findings";
import { action as observationsAction } from "~/routes/api/observations";
import { testDb } from "../../setup/integration-worker";
import {
  causeId,
  checkId,
  cookieFor,
  freshCase,
  memberFor,
  refusal,
  request,
  run,
  symptomId,
} from "../api/helpers";

// A pool of its own, wide enough that the concurrent calls really run side by side.
let wide: { db: Db; end: () => Promise<void> };
beforeAll(() => {
  const { db, pool } = createDb(process.env.DATABASE_URL!, { max: 12 });
  wide = { db, end: () => pool.end() };
});
afterAll(async () => {
  await wide.end();
});

async function post(login: string, kind: "observations" | "findings", id: string, json: unknown) {
  const handler = kind === "findings" ? findingsAction : observationsAction;
  return run(
    handler,
    wide.db,
    request(`/api/cases/${id}/${kind}`, { cookie: await cookieFor(testDb(), login), json }),
    { caseId: id },
  );
}

const auditRows = async (id: string, action: string) =>
  (
    await testDb()
      .select({ n: count() })
      .from(auditLog)
      .where(and(eq(auditLog.entityId, id), eq(auditLog.action, action)))
  )[0].n;

describe("two members adding evidence at once", () => {
  it("keeps every observation and finding both of them sent", async () => {
    const id = await freshCase(testDb());
    const answers = await Promise.all([
      post("priya-hale", "observations", id, { symptomId: symptomId("vibration_braking"), present: true }),
      post("tomas-varga", "observations", id, { symptomId: symptomId("squeal_braking"), present: false }),
      post("priya-hale", "findings", id, { checkId: checkId("brake_road_test"), result: "fail" }),
      post("tomas-varga", "findings", id, { checkId: checkId("disc_runout_dial_gauge"), reading: "0.09 mm" }),
      post("priya-hale", "observations", id, { symptomId: symptomId("pedal_pulsing"), present: true }),
      post("tomas-varga", "findings", id, { checkId: checkId("wheel_drag_spin"), result: "pass" }),
    ]);
    expect(answers.map((a) => a.status)).toEqual([201, 201, 201, 201, 201, 201]);
    const obs = await testDb()
      .select({ symptomId: observations.symptomId })
      .from(observations)
      .where(eq(observations.caseId, id));
    const fnd = await testDb()
      .select({ checkId: findings.checkId })
      .from(findings)
      .where(eq(findings.caseId, id));
    expect(obs.map((o) => o.symptomId).sort()).toEqual(
      [symptomId("vibration_braking"), symptomId("squeal_braking"), symptomId("pedal_pulsing")].sort(),
    );
    expect(fnd.map((f) => f.checkId).sort()).toEqual(
      [checkId("brake_road_test"), checkId("disc_runout_dial_gauge"), checkId("wheel_drag_spin")].sort(),
    );
    expect((await auditRows(id, "case.observation")) + (await auditRows(id, "case.finding"))).toBe(6);
  });
});

describe("the same check recorded by two members at once", () => {
  it("stores one finding: one 201, one 409 (five rounds)", async () => {
    for (let round = 0; round < 5; round++) {
      const id = await freshCase(testDb());
      const [a, b] = await Promise.all([
        post("priya-hale", "findings", id, { checkId: checkId("brake_road_test"), result: "fail" }),
        post("tomas-varga", "findings", id, { checkId: checkId("brake_road_test"), result: "pass" }),
      ]);
      expect([a.status, b.status].sort()).toEqual([201, 409]);
      const loser = a.status === 409 ? a : b;
      expect(typeof loser.body.error).toBe("string");
      const rows = await testDb()
        .select({ result: findings.result })
        .from(findings)
        .where(eq(findings.caseId, id));
      expect(rows).toHaveLength(1);
      // The stored result is the winner's.
      expect(rows[0].result).toBe(a.status === 201 ? "fail" : "pass");
      expect(await auditRows(id, "case.finding")).toBe(1);
    }
  });

  it("stores one finding when both loaded the case before either wrote (the database's unique key decides)", async () => {
    const priya = await memberFor(testDb(), "priya-hale");
    const tomas = await memberFor(testDb(), "tomas-varga");
    const id = await freshCase(testDb());
    // Both snapshots have no findings, so the in-memory duplicate check passes for both.
    const [p, t] = await Promise.all([loadCase(wide.db, priya, id), loadCase(wide.db, tomas, id)]);
    const input = { checkId: checkId("wheel_drag_spin"), result: "pass" as const };
    const results = await Promise.allSettled([
      recordFinding(wide.db, priya, p, input),
      recordFinding(wide.db, tomas, t, input),
    ]);
    expect(results.map((r) => r.status).sort()).toEqual(["fulfilled", "rejected"]);
    const lost = results.find((r): r is PromiseRejectedResult => r.status === "rejected")!;
    expect((await refusal(Promise.reject(lost.reason))).status).toBe(409);
    expect(await testDb().select().from(findings).where(eq(findings.caseId, id))).toHaveLength(1);
    expect(await auditRows(id, "case.finding")).toBe(1);
  });
});

describe("two conclusions from the same version (workflow.server's conclude)", () => {
  it("one stands; the other is refused with 409 and the case as it is now (five rounds)", async () => {
    const priya = await memberFor(testDb(), "priya-hale");
    const tomas = await memberFor(testDb(), "tomas-varga");
    for (let round = 0; round < 5; round++) {
      const id = await freshCase(testDb());
      // Both loaded the case before either wrote: same version in hand.
      const [seenByPriya, seenByTomas] = await Promise.all([
        loadCase(wide.db, priya, id),
        loadCase(wide.db, tomas, id),
      ]);
      expect(seenByPriya.version).toBe(seenByTomas.version);
      const results = await Promise.allSettled([
        conclude(wide.db, priya, seenByPriya, {
          causeId: causeId("brake_disc_runout_dtv"),
          notes: "Disc run-out 0.09 mm.",
          version: seenByPriya.version,
        }),
        conclude(wide.db, tomas, seenByTomas, {
          causeId: causeId("brake_pad_deposits"),
          notes: "Pad transfer on the disc face.",
          version: seenByTomas.version,
        }),
      ]);
      const won = results.findIndex((r) => r.status === "fulfilled");
      const lost = results.findIndex((r) => r.status === "rejected");
      expect(won).toBeGreaterThanOrEqual(0);
      expect(lost).toBeGreaterThanOrEqual(0);
      const { status, body } = await refusal(Promise.reject((results[lost] as PromiseRejectedResult).reason));
      expect(status).toBe(409);
      const current = body.current as { state: string; version: number; conclusionNotes: string };
      expect(current).toMatchObject({ state: "concluded", version: seenByPriya.version + 1 });
      const [row] = await testDb()
        .select({ causeId: cases.conclusionCauseId, notes: cases.conclusionNotes })
        .from(cases)
        .where(eq(cases.id, id));
      expect(row.causeId).toBe(won === 0 ? causeId("brake_disc_runout_dtv") : causeId("brake_pad_deposits"));
      expect(current.conclusionNotes).toBe(row.notes);
      expect(await auditRows(id, "case.conclude")).toBe(1);
    }
  });

  it("two complaint edits from the same version: the loser sees the winner's text", async () => {
    const tomas = await memberFor(testDb(), "tomas-varga");
    const priya = await memberFor(testDb(), "priya-hale");
    const id = await freshCase(testDb());
    const c = await loadCase(wide.db, priya, id);
    const results = await Promise.allSettled([
      updateComplaint(wide.db, priya, c, "Judder from 70 mph under braking.", c.version),
      updateComplaint(wide.db, tomas, c, "Steering shake when braking downhill.", c.version),
    ]);
    expect(results.map((r) => r.status).sort()).toEqual(["fulfilled", "rejected"]);
    const lost = results.find((r): r is PromiseRejectedResult => r.status === "rejected")!;
    const { status, body } = await refusal(Promise.reject(lost.reason));
    expect(status).toBe(409);
    const [row] = await testDb().select({ complaint: cases.complaint }).from(cases).where(eq(cases.id, id));
    expect((body.current as { complaint: string }).complaint).toBe(row.complaint);
  });
});
