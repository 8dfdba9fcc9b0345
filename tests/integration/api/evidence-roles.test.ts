// Who may add and remove evidence through the API (docs/permissions.md): technicians and seniors
// on any open case, an apprentice on the cases assigned to them and only checks within their
// skill, advisors and admins never. Removal answers 200 with the re-ranked case, an unknown item 404.
import { randomUUID } from "node:crypto";
import { and, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { auditLog, findings, observations } from "~/db/schema";
import { action as findingsAction } from "~/routes/api/findings";
import { action as observationsAction } from "~/routes/api/observations";
import { seedId } from "../../../seeds/ids";
import { testDb } from "../../setup/integration-worker";
import {
  caseId,
  checkId,
  cookieFor,
  isCleanError,
  request,
  run,
  snapshot,
  symptomId,
  type Send,
} from "./helpers";

type Kind = "observations" | "findings";
const handler = (kind: Kind) => (kind === "findings" ? findingsAction : observationsAction);

async function as(login: string, kind: Kind, id: string, send: Send, itemId?: string) {
  const path = `/api/cases/${id}/${kind}${itemId ? `/${itemId}` : ""}`;
  return run(handler(kind), testDb(), request(path, { cookie: await cookieFor(testDb(), login), ...send }), {
    caseId: id,
    itemId,
  });
}

async function refused(login: string, kind: Kind, id: string, send: Send, status: number, itemId?: string) {
  const before = await snapshot(testDb(), id);
  const a = await as(login, kind, id, send, itemId);
  expect(a.status, JSON.stringify(a.body)).toBe(status);
  expect(isCleanError(a), JSON.stringify(a.body)).toBe(true);
  expect(await snapshot(testDb(), id)).toEqual(before);
  return a;
}

const obs = (key: string) => ({ json: { symptomId: symptomId(key), present: true } });
const pass = (key: string) => ({ json: { checkId: checkId(key), result: "pass" } });

describe("an apprentice (Ollie Mbeki; seeds/demo/people.ts)", () => {
  it("is refused on a case not assigned to him (b1 is Priya's)", async () => {
    await refused("ollie-mbeki", "observations", caseId("b1"), obs("pedal_pulsing"), 403);
    await refused("ollie-mbeki", "findings", caseId("b1"), pass("disc_surface_visual"), 403);
  });

  it("adds evidence on his own case b2, for a check at apprentice level", async () => {
    const before = await snapshot(testDb(), caseId("b2"));
    const o = await as("ollie-mbeki", "observations", caseId("b2"), obs("grinding_braking"));
    const f = await as("ollie-mbeki", "findings", caseId("b2"), pass("disc_surface_visual"));
    // pad_thickness is apprentice level with rule `value >= 3 mm`: 4 mm ≥ 3 mm passes.
    const m = await as("ollie-mbeki", "findings", caseId("b2"), {
      json: { checkId: checkId("pad_thickness"), reading: "4 mm" },
    });
    expect([o.status, f.status, m.status]).toEqual([201, 201, 201]);
    expect(m.body.result).toBe("pass");
    const after = await snapshot(testDb(), caseId("b2"));
    expect(after.observations - before.observations).toBe(1);
    expect(after.findings - before.findings).toBe(2);
    expect(after.audit - before.audit).toBe(3); // one audit row per change (DEVELOPERS.md)
  });

  it("is refused a check above his skill on his own case", async () => {
    // disc_runout_dial_gauge needs a technician, brake_bleed_judgement a senior (seeds/kb/brakes.ts).
    const a = await refused(
      "ollie-mbeki",
      "findings",
      caseId("b2"),
      { json: { checkId: checkId("disc_runout_dial_gauge"), reading: "0.03 mm" } },
      403,
    );
    expect(a.body.error).toMatch(/technician/);
    await refused("ollie-mbeki", "findings", caseId("b2"), pass("brake_bleed_judgement"), 403);
  });
});

describe("roles that never record evidence", () => {
  it("refuses an advisor (Dana Reyes) and an admin (Ines Okafor) with 403", async () => {
    for (const login of ["dana-reyes", "ines-okafor"]) {
      await refused(login, "observations", caseId("b1"), obs("pedal_pulsing"), 403);
      await refused(login, "findings", caseId("b1"), pass("brake_road_test"), 403);
    }
  });

  it("refuses the role before validating the body: an advisor's invalid finding is 403, not 400", async () => {
    await refused(
      "dana-reyes",
      "findings",
      caseId("b1"),
      { json: { checkId: "not-an-id", result: "maybe" } },
      403,
    );
  });

  it("refuses a body that is not JSON at all with 400 for anyone, before any role is looked at", async () => {
    // The request guard's transport check (app/http/request-guard.server.ts): it says nothing about the case.
    await refused("dana-reyes", "findings", caseId("b1"), { raw: "not json" }, 400);
    await refused("priya-hale", "findings", caseId("b1"), { raw: "not json" }, 400);
  });

  it("answers another workshop's member with 404 and changes nothing", async () => {
    await refused("rowan-quill", "observations", caseId("b1"), obs("pedal_pulsing"), 404);
  });
});

describe("removing evidence", () => {
  it("DELETE of an observation answers 200 with the case without it, removes it and writes an audit row", async () => {
    const added = await as("priya-hale", "observations", caseId("b1"), obs("pull_braking"));
    const id = added.body.id as string;
    const before = await snapshot(testDb(), caseId("b1"));
    const a = await as("priya-hale", "observations", caseId("b1"), { method: "DELETE" }, id);
    expect(a.status).toBe(200);
    expect(JSON.stringify(a.body.view)).not.toContain(id);
    expect(await testDb().select().from(observations).where(eq(observations.id, id))).toEqual([]);
    const after = await snapshot(testDb(), caseId("b1"));
    expect(after.observations).toBe(before.observations - 1);
    const rows = await testDb()
      .select()
      .from(auditLog)
      .where(and(eq(auditLog.entityId, caseId("b1")), eq(auditLog.action, "case.observation_remove")));
    expect(rows).toHaveLength(1);
  });

  it("DELETE of a finding answers 200 with the case without it, and removes it", async () => {
    const added = await as("priya-hale", "findings", caseId("b1"), pass("brake_road_test"));
    expect(added.status).toBe(201);
    const a = await as("priya-hale", "findings", caseId("b1"), { method: "DELETE" }, added.body.id as string);
    expect(a.status).toBe(200);
    expect(JSON.stringify(a.body.view)).not.toContain(added.body.id as string);
    expect(
      await testDb()
        .select()
        .from(findings)
        .where(eq(findings.id, added.body.id as string)),
    ).toEqual([]);
    // Gone, so the same check may be recorded again.
    expect((await as("priya-hale", "findings", caseId("b1"), pass("brake_road_test"))).status).toBe(201);
  });

  it("DELETE of an unknown item answers 404 and changes nothing", async () => {
    await refused("priya-hale", "observations", caseId("b1"), { method: "DELETE" }, 404, randomUUID());
    await refused("priya-hale", "findings", caseId("b1"), { method: "DELETE" }, 404, randomUUID());
  });

  it("DELETE of another case's item through this case answers 404 and leaves it", async () => {
    const b2Squeal = seedId("obs:b2:squeal_braking"); // the seed's id scheme (seeds/demo.ts)
    await refused("priya-hale", "observations", caseId("b1"), { method: "DELETE" }, 404, b2Squeal);
    expect(
      await testDb().select({ id: observations.id }).from(observations).where(eq(observations.id, b2Squeal)),
    ).toHaveLength(1);
  });

  it("DELETE with an item id that is not a uuid answers 404, like an unknown one", async () => {
    await refused("priya-hale", "observations", caseId("b1"), { method: "DELETE" }, 404, "not-a-uuid");
    await refused("priya-hale", "findings", caseId("b1"), { method: "DELETE" }, 404, "42");
  });

  it("an apprentice cannot remove evidence from a case that is not his", async () => {
    const b1Vibration = seedId("obs:b1:vibration_braking");
    await refused("ollie-mbeki", "observations", caseId("b1"), { method: "DELETE" }, 403, b1Vibration);
  });

  it("answers 405 for POST on an item and DELETE on the collection", async () => {
    await refused("priya-hale", "findings", caseId("b1"), { method: "DELETE" }, 405);
    await refused("priya-hale", "observations", caseId("b1"), obs("pedal_pulsing"), 405, randomUUID());
  });
});
