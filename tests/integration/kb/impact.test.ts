// The impact preview against the real database: a concluded case whose confirmed cause the base
// ranks low moves up when the link from its symptom is previewed stronger, the counts of cases
// with the confirmed cause first and in the top three are before/after of the same cases, and a
// preview writes nothing.
import { count, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { loadCaseForChange } from "~/cases/case.server";
import { recordObservation } from "~/cases/evidence.server";
import { openCase } from "~/cases/open-case.server";
import { conclude } from "~/cases/workflow.server";
import { auditLog, workshops } from "~/db/schema";
import { previewChange } from "~/kb/impact.server";
import { seedId } from "../../../seeds/ids";
import { kbId } from "../../../seeds/knowledge";
import { testDb } from "../../setup/integration-worker";
import { memberFor } from "../api/helpers";

const db = () => testDb();
const BRAMBLEGATE = seedId("workshop:bramblegate");
const JUDDER = kbId("bramblegate", "symptom", "vibration_braking");
const SHIMS = kbId("bramblegate", "cause", "brake_pad_noise");

describe("the impact preview", () => {
  it("moves a concluded case's confirmed cause up when its symptom's link is previewed stronger", async () => {
    const priya = await memberFor(db(), "priya-hale");
    const opened = await openCase(db(), priya, {
      vehicleId: seedId("vehicle:orlan-brisk"),
      mileageKm: 70_000,
      complaint: "Judder when braking; the pads had no shims.",
    });
    await recordObservation(db(), priya, await loadCaseForChange(db(), priya, opened.id), {
      symptomId: JUDDER,
      present: true,
      source: "owner",
    });
    const c = await loadCaseForChange(db(), priya, opened.id);
    await conclude(db(), priya, c, {
      causeId: SHIMS,
      notes: "Shims missing; judder gone after refit.",
      version: c.version,
    });

    const before = await Promise.all([
      db().select({ v: workshops.kbVersion }).from(workshops).where(eq(workshops.id, BRAMBLEGATE)),
      db().select({ n: count() }).from(auditLog),
    ]);
    const impact = await previewChange(db(), BRAMBLEGATE, {
      link: "symptom",
      symptomId: JUDDER,
      causeId: SHIMS,
      p: 0.95,
    });
    const mine = impact.moved.find((m) => m.id === opened.id);
    expect(mine, JSON.stringify(impact)).toBeDefined();
    expect(mine!.after).not.toBeNull();
    expect(mine!.after!).toBeLessThan(mine!.before ?? Infinity);
    expect(impact.cases).toBeGreaterThanOrEqual(1);
    expect(impact.topThree.after).toBeGreaterThanOrEqual(impact.first.after);
    // Previewing the link as it stands moves nothing.
    const unchanged = await previewChange(db(), BRAMBLEGATE, {
      link: "symptom",
      symptomId: JUDDER,
      causeId: SHIMS,
      p: 0.0001,
    });
    expect(unchanged.first.before).toBe(impact.first.before);
    const after = await Promise.all([
      db().select({ v: workshops.kbVersion }).from(workshops).where(eq(workshops.id, BRAMBLEGATE)),
      db().select({ n: count() }).from(auditLog),
    ]);
    expect(after).toEqual(before);
  });
});
