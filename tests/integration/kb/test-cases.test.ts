// The workshop's test cases against the real database: a concluded case is kept with its evidence
// and answer; an open one is refused; the impact preview ranks the test cases before and after a
// change beside the workshop's cases; their page says where each known answer ranks now; removing
// one is audited. The demo seed keeps its concluded cases as test cases.
import { and, count, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { loadCaseForChange } from "~/cases/case.server";
import { recordObservation } from "~/cases/evidence.server";
import { openCase } from "~/cases/open-case.server";
import { conclude } from "~/cases/workflow.server";
import { auditLog, kbTestCases } from "~/db/schema";
import { previewChange } from "~/kb/impact.server";
import { keepTestCase, listTestCases, removeTestCase } from "~/kb/test-cases.server";
import { seedId } from "../../../seeds/ids";
import { kbId } from "../../../seeds/knowledge";
import { testDb } from "../../setup/integration-worker";
import { memberFor, refusal } from "../api/helpers";

const db = () => testDb();
const BRAMBLEGATE = seedId("workshop:bramblegate");
const JUDDER = kbId("bramblegate", "symptom", "vibration_braking");
const SHIMS = kbId("bramblegate", "cause", "brake_pad_noise");

describe("the knowledge base's test cases", () => {
  it("come with the demo: every concluded demo case is one, with its evidence", async () => {
    const { tests } = await listTestCases(db(), BRAMBLEGATE);
    expect(tests.length).toBeGreaterThanOrEqual(3);
    expect(tests.every((t) => t.evidence > 0 && t.fromCase)).toBe(true);
  });

  it("keeps a concluded case, ranks it in the preview before and after, and removes it", async () => {
    const [priya, tomas] = [await memberFor(db(), "priya-hale"), await memberFor(db(), "tomas-varga")];
    const opened = await openCase(db(), priya, {
      vehicleId: seedId("vehicle:orlan-brisk"),
      mileageKm: 72_000,
      complaint: "Judder in the pedal; new pads were fitted without shims.",
    });
    await recordObservation(db(), priya, await loadCaseForChange(db(), priya, opened.id), {
      symptomId: JUDDER,
      present: true,
      source: "owner",
    });
    // Not yet concluded: refused, nothing kept.
    const early = await refusal(keepTestCase(db(), tomas, opened.id, "Too early"));
    expect(early.status).toBe(409);
    const c = await loadCaseForChange(db(), priya, opened.id);
    await conclude(db(), priya, c, {
      causeId: SHIMS,
      notes: "Shims missing; judder gone after refit.",
      version: c.version,
    });
    const kept = await keepTestCase(db(), tomas, opened.id, "Judder from pads without shims");

    const listed = (await listTestCases(db(), BRAMBLEGATE)).tests.find((t) => t.id === kept.id)!;
    expect(listed).toMatchObject({
      name: "Judder from pads without shims",
      evidence: 1,
      fromCase: { id: opened.id },
    });

    // The same strengthening that moves the workshop's case moves the test case.
    const impact = await previewChange(db(), BRAMBLEGATE, {
      link: "symptom",
      symptomId: JUDDER,
      causeId: SHIMS,
      p: 0.95,
    });
    const moved = impact.tests.moved.find((m) => m.id === kept.id);
    expect(moved, JSON.stringify(impact.tests)).toMatchObject({ label: "Judder from pads without shims" });
    expect(moved!.after!).toBeLessThan(moved!.before ?? Infinity);
    expect(moved!.before).toBe(listed.place);
    expect(impact.tests.cases).toBe((await listTestCases(db(), BRAMBLEGATE)).tests.length);

    await removeTestCase(db(), tomas, kept.id);
    expect(
      (await db().select({ n: count() }).from(kbTestCases).where(eq(kbTestCases.id, kept.id)))[0].n,
    ).toBe(0);
    const [{ n }] = await db()
      .select({ n: count() })
      .from(auditLog)
      .where(and(eq(auditLog.entity, "kb_test_case"), eq(auditLog.entityId, kept.id)));
    expect(n).toBe(2); // kept, removed
  });

  it("does not let another workshop remove one", async () => {
    const kit = await memberFor(db(), "kit-arbuthnot");
    const [one] = await db()
      .select({ id: kbTestCases.id })
      .from(kbTestCases)
      .where(eq(kbTestCases.workshopId, BRAMBLEGATE));
    expect((await refusal(removeTestCase(db(), kit, one.id))).status).toBe(404);
  });
});
