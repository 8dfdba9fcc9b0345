// Growing and pruning the cause tree against the real database: a failure mode added under a
// component is ranked from the next version; a merge moves the links the other cause lacks, keeps
// the other's own, retires the merged cause and leaves a concluded case naming it readable; a new
// link is refused when it exists already; wrong levels and foreign ids change nothing.
import { and, count, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { loadCase, loadCaseForChange } from "~/cases/case.server";
import { recordObservation } from "~/cases/evidence.server";
import { openCase } from "~/cases/open-case.server";
import { conclude } from "~/cases/workflow.server";
import { auditLog, causes, symptomLinks, workshops } from "~/db/schema";
import { describeAudit } from "~/audit/describe";
import { kbVersion, loadKnowledge } from "~/kb/knowledge.server";
import { addCause, addLink, mergeCause } from "~/kb/tree-edit.server";
import { seedId } from "../../../seeds/ids";
import { kbId } from "../../../seeds/knowledge";
import { testDb } from "../../setup/integration-worker";
import { memberFor, refusal } from "../api/helpers";

const db = () => testDb();
const BRAMBLEGATE = seedId("workshop:bramblegate");
const cause = (key: string) => kbId("bramblegate", "cause", key);
const symptom = (key: string) => kbId("bramblegate", "symptom", key);
const links = async (causeId: string) =>
  Object.fromEntries(
    (await db().select().from(symptomLinks).where(eq(symptomLinks.causeId, causeId))).map((l) => [
      l.symptomId,
      l.p,
    ]),
  );
const audits = async () => (await db().select({ n: count() }).from(auditLog))[0].n;

describe("growing and pruning the cause tree", () => {
  it("adds a failure mode under a component, ranked from the next version", async () => {
    const tomas = await memberFor(db(), "tomas-varga");
    const [pads] = await db()
      .select()
      .from(causes)
      .where(eq(causes.id, cause("brake_pad_noise")));
    const v0 = await kbVersion(db(), BRAMBLEGATE);
    const made = await addCause(db(), tomas, pads.parentId!, {
      name: "Pad backing plate rusted and lifting the friction material",
      description: "Rust under the friction material lifts it from the plate.",
      ownerDescription: "The brake pads are coming apart from rust.",
      baseRate: 1.5,
      priority: "soon",
      repairMinutes: 60,
      partsCost: 45,
    });
    expect(made.kbVersion).toBe(v0 + 1);
    const kb = await loadKnowledge(db(), BRAMBLEGATE, made.kbVersion);
    expect(kb.causes.find((c) => c.id === made.id)).toMatchObject({
      level: "failure_mode",
      baseRate: 1.5,
      parentId: pads.parentId,
    });
    await addLink(db(), tomas, {
      link: "symptom",
      causeId: made.id,
      otherId: symptom("grinding_braking"),
      p: 0.6,
    });
    // Linked already: refused with the message beside the symptom's field, nothing written.
    const a0 = await audits();
    const again = await refusal(
      addLink(db(), tomas, {
        link: "symptom",
        causeId: made.id,
        otherId: symptom("grinding_braking"),
        p: 0.3,
      }),
    );
    expect(again.status).toBe(409);
    expect((again.body as { errors: Record<string, string[]> }).errors.symptomId[0]).toMatch(
      /linked already/,
    );
    expect(await audits()).toBe(a0);
    expect(await links(made.id)).toEqual({ [symptom("grinding_braking")]: 0.6 });
  });

  it("refuses a failure mode under a failure mode, and one without a base rate", async () => {
    const tomas = await memberFor(db(), "tomas-varga");
    const [v0, a0] = [await kbVersion(db(), BRAMBLEGATE), await audits()];
    const under = await refusal(
      addCause(db(), tomas, cause("brake_pad_noise"), {
        name: "Beneath a leaf",
        description: "",
        ownerDescription: "",
        baseRate: 1,
        priority: "watch",
      }),
    );
    expect(under.status).toBe(400);
    const [pads] = await db()
      .select()
      .from(causes)
      .where(eq(causes.id, cause("brake_pad_noise")));
    const bare = await refusal(
      addCause(db(), tomas, pads.parentId!, {
        name: "No figures given",
        description: "",
        ownerDescription: "",
      }),
    );
    expect(bare.status).toBe(400);
    expect([await kbVersion(db(), BRAMBLEGATE), await audits()]).toEqual([v0, a0]);
  });

  it("merges a failure mode into another: moves the links the other lacks, keeps the other's own", async () => {
    const [priya, tomas] = [await memberFor(db(), "priya-hale"), await memberFor(db(), "tomas-varga")];
    const [from, into] = [cause("brake_pad_deposits"), cause("brake_disc_runout_dtv")];
    // A concluded case that names the cause about to be merged.
    const opened = await openCase(db(), priya, {
      vehicleId: seedId("vehicle:orlan-brisk"),
      mileageKm: 71_000,
      complaint: "Pedal pulses when stopping.",
    });
    await recordObservation(db(), priya, await loadCaseForChange(db(), priya, opened.id), {
      symptomId: symptom("vibration_braking"),
      present: true,
      source: "owner",
    });
    const c = await loadCaseForChange(db(), priya, opened.id);
    await conclude(db(), priya, c, {
      causeId: from,
      notes: "Pad material on the disc face.",
      version: c.version,
    });

    const [fromLinks, intoLinks] = [await links(from), await links(into)];
    const shared = Object.keys(fromLinks).filter((s) => s in intoLinks);
    const moving = Object.keys(fromLinks).filter((s) => !(s in intoLinks));
    const done = await mergeCause(db(), tomas, from, into);
    expect(done.moved).toBeGreaterThanOrEqual(moving.length);
    expect(done.kept).toBeGreaterThanOrEqual(shared.length);
    const after = await links(into);
    for (const s of moving) expect(after[s]).toBe(fromLinks[s]);
    for (const s of shared) expect(after[s]).toBe(intoLinks[s]); // the other's own strength stands
    const [merged] = await db().select().from(causes).where(eq(causes.id, from));
    expect(merged.mergedIntoId).toBe(into);
    expect(merged.retiredAt).not.toBeNull();
    // No longer ranked; the concluded case still names it.
    const kb = await loadKnowledge(db(), BRAMBLEGATE, done.kbVersion);
    expect(kb.causes.some((x) => x.id === from)).toBe(false);
    expect((await loadCase(db(), priya, opened.id)).conclusionCause).toBe(merged.name);
    const [entry] = await db()
      .select()
      .from(auditLog)
      .where(and(eq(auditLog.action, "kb.cause.merge"), eq(auditLog.entityId, from)));
    expect(describeAudit(entry).text).toMatch(
      new RegExp(`^merged “.+” into “.+”: \\d+ links moved, ${done.kept} kept`),
    );
  });

  it("refuses a merge across levels, into itself, or from another workshop, and changes nothing", async () => {
    const [tomas, kit] = [await memberFor(db(), "tomas-varga"), await memberFor(db(), "kit-arbuthnot")];
    const [pads] = await db()
      .select()
      .from(causes)
      .where(eq(causes.id, cause("brake_pads_worn")));
    const v0 = await db()
      .select({ v: workshops.kbVersion })
      .from(workshops)
      .where(eq(workshops.id, BRAMBLEGATE));
    expect((await refusal(mergeCause(db(), tomas, cause("brake_pads_worn"), pads.parentId!))).status).toBe(
      400,
    );
    expect(
      (await refusal(mergeCause(db(), tomas, cause("brake_pads_worn"), cause("brake_pads_worn")))).status,
    ).toBe(400);
    expect(
      (await refusal(mergeCause(db(), kit, cause("brake_pads_worn"), cause("brake_pads_metal")))).status,
    ).toBe(404);
    expect(
      await db().select({ v: workshops.kbVersion }).from(workshops).where(eq(workshops.id, BRAMBLEGATE)),
    ).toEqual(v0);
  });
});
