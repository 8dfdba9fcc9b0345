// One query reads a case. A screen gets the history and the workshop's outcome counts with it; a
// change (evidence, conclusion, sign-off) reads the case and its evidence without those aggregates.
// Another workshop's case is "not found" either way.
import { describe, expect, it } from "vitest";
import { loadCase, loadCaseForChange, loadCaseWithHistory } from "~/cases/case.server";
import { auditLog } from "~/db/schema";
import { outcomeCounts } from "./outcome-counts";
import { caseId, memberFor, refusal } from "../api/helpers";
import { testDb } from "../../setup/integration-worker";

describe("reading a case", () => {
  it("gives a screen this case's history only, newest first, and the outcome counts the knowledge module computes", async () => {
    const member = await memberFor(testDb(), "priya-hale");
    const id = caseId("b1");
    const row = (
      action: string,
      at: string,
      entityId = id,
      workshopId: string | null = member.workshopId,
    ) => ({
      workshopId,
      actorUserId: member.userId,
      action,
      entity: "case",
      entityId,
      after: {},
      at: new Date(at),
    });
    await testDb()
      .insert(auditLog)
      .values([
        row("case.open", "2026-11-30T08:00:00Z"),
        row("case.finding", "2026-11-30T09:30:00Z"),
        row("case.observation", "2026-11-30T09:00:00Z"),
        row("case.finding", "2026-11-30T10:00:00Z", caseId("b2")), // another case
        row("case.finding", "2026-11-30T10:00:00Z", id, null), // no workshop: not this workshop's trail
      ]);
    const c = await loadCaseWithHistory(testDb(), member, id);
    expect(c.history.map((h) => h.action)).toEqual(["case.finding", "case.observation", "case.open"]);
    expect(c.history.map((h) => h.actor)).toEqual(["Priya Hale", "Priya Hale", "Priya Hale"]);
    expect(c.history.every((h) => h.at instanceof Date)).toBe(true);
    expect(c.history[0].at.toISOString()).toBe("2026-11-30T09:30:00.000Z");
    expect(c.outcomes).toEqual(await outcomeCounts(testDb(), c.workshop.id, c.vehicle.fuelType));
    expect(c.findings.every((f) => f.recordedAt instanceof Date)).toBe(true);
  });

  it("gives a change the same case and evidence, without history or outcome counts", async () => {
    const member = await memberFor(testDb(), "priya-hale");
    const [screen, change] = [
      await loadCaseWithHistory(testDb(), member, caseId("b1")),
      await loadCaseForChange(testDb(), member, caseId("b1")),
    ];
    expect(change).not.toHaveProperty("history");
    expect(change).not.toHaveProperty("outcomes");
    const { history: _h, outcomes: _o, ...fields } = screen;
    expect(change).toEqual(fields);
  });

  it("answers 404 for another workshop's case on both reads", async () => {
    const outsider = await memberFor(testDb(), "kit-arbuthnot");
    expect((await refusal(loadCase(testDb(), outsider, caseId("b1")))).status).toBe(404);
    expect((await refusal(loadCaseForChange(testDb(), outsider, caseId("b1")))).status).toBe(404);
  });
});
