// The impact preview of a proposal before it is accepted, against the real database: a proposed
// missing cause shown strongly as a test case's only symptom pushes that case's known answer down;
// previewing writes nothing; a reviewed proposal has no preview.
import { count, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { auditLog, workshops } from "~/db/schema";
import { loadCaseForChange } from "~/cases/case.server";
import { recordObservation } from "~/cases/evidence.server";
import { openCase } from "~/cases/open-case.server";
import { conclude } from "~/cases/workflow.server";
import { previewProposal, propose, reviewProposal } from "~/kb/proposals.server";
import { keepTestCase } from "~/kb/test-cases.server";
import { seedId } from "../../../seeds/ids";
import { kbId } from "../../../seeds/knowledge";
import { testDb } from "../../setup/integration-worker";
import { memberFor, refusal } from "../api/helpers";

const db = () => testDb();
const BRAMBLEGATE = seedId("workshop:bramblegate");
const JUDDER = kbId("bramblegate", "symptom", "vibration_braking");
const BESIDE = kbId("bramblegate", "cause", "brake_disc_runout_dtv");
const SHIMS = kbId("bramblegate", "cause", "brake_pad_noise");
const state = async () => [
  (await db().select({ v: workshops.kbVersion }).from(workshops).where(eq(workshops.id, BRAMBLEGATE)))[0].v,
  (await db().select({ n: count() }).from(auditLog))[0].n,
];

describe("previewing a proposal", () => {
  it("shows which cases and test cases a proposed missing cause would move, and writes nothing", async () => {
    const [tech, senior] = [await memberFor(db(), "priya-hale"), await memberFor(db(), "tomas-varga")];
    const { id } = await propose(db(), tech, {
      caseId: seedId("case:b1"),
      kind: "cause",
      symptomId: JUDDER,
      causeId: BESIDE,
      causeName: "Wheel hub face rusted under the disc",
      p: 0.95,
      note: "Disc true, hub face scaled with rust; the judder came back until it was cleaned.",
    });
    // A test case with the judder alone, its known answer a cause the judder points to only weakly
    // (pads without shims), so a new cause strongly shown as judder ranks above it.
    const opened = await openCase(db(), tech, {
      vehicleId: seedId("vehicle:orlan-brisk"),
      mileageKm: 73_000,
      complaint: "Judder through the pedal from speed.",
    });
    await recordObservation(db(), tech, await loadCaseForChange(db(), tech, opened.id), {
      symptomId: JUDDER,
      present: true,
      source: "owner",
    });
    const c = await loadCaseForChange(db(), tech, opened.id);
    await conclude(db(), tech, c, {
      causeId: SHIMS,
      notes: "Shims missing; judder gone after refit.",
      version: c.version,
    });
    const kept = await keepTestCase(db(), senior, opened.id, "Judder alone, pads without shims");

    const before = await state();
    const impact = await previewProposal(db(), BRAMBLEGATE, id);
    // A new cause strongly linked to the judder can only push known answers down, never up.
    expect(impact.tests.first.after).toBeLessThanOrEqual(impact.tests.first.before);
    expect(impact.first.after).toBeLessThanOrEqual(impact.first.before);
    const judder = impact.tests.moved.find((m) => m.id === kept.id);
    expect(judder, JSON.stringify(impact.tests)).toBeDefined();
    expect(judder!.after!).toBeGreaterThan(judder!.before!);
    expect(await state()).toEqual(before);

    await reviewProposal(db(), senior, id, { decision: "reject", comment: "Not seen it here." });
    expect((await refusal(previewProposal(db(), BRAMBLEGATE, id))).status).toBe(409);
  });
});
