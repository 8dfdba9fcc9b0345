// Proposals and their review against the real database: a technician's proposal from a case
// changes nothing until a senior accepts it; accepting a missing cause creates the failure mode
// beside the one picked, links the case's symptom at the proposed strength and moves the version
// on; a reviewed proposal cannot be reviewed again; another workshop's case or proposal is not found.
import { and, count, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { auditLog, causes, kbProposals, symptomLinks, symptoms, workshops } from "~/db/schema";
import { listProposals, previewProposal, propose, reviewProposal } from "~/kb/proposals.server";
import { seedId } from "../../../seeds/ids";
import { kbId } from "../../../seeds/knowledge";
import { testDb } from "../../setup/integration-worker";
import { memberFor, refusal } from "../api/helpers";

const db = () => testDb();
const BRAMBLEGATE = seedId("workshop:bramblegate");
const CASE = seedId("case:b1");
const SYMPTOM = kbId("bramblegate", "symptom", "vibration_braking");
const BESIDE = kbId("bramblegate", "cause", "brake_disc_runout_dtv");
const version = async () =>
  (await db().select({ v: workshops.kbVersion }).from(workshops).where(eq(workshops.id, BRAMBLEGATE)))[0].v;
const audits = async () => (await db().select({ n: count() }).from(auditLog))[0].n;

describe("knowledge-base proposals", () => {
  it("a missing symptom proposed from a case is made in its cause's system and linked when accepted", async () => {
    const [tech, senior] = [await memberFor(db(), "priya-hale"), await memberFor(db(), "tomas-varga")];
    const v0 = await version();
    const { id } = await propose(db(), tech, {
      caseId: CASE,
      kind: "symptom",
      symptomName: "Steering wheel shimmy only after a wash",
      causeId: BESIDE,
      p: 0.15,
      note: "Judder for the first stops after the car has been washed; gone once the discs are dry.",
    });
    const [listed] = (await listProposals(db(), BRAMBLEGATE)).filter((p) => p.id === id);
    expect(listed).toMatchObject({
      kind: "symptom",
      symptomName: "Steering wheel shimmy only after a wash",
      newSymptom: true,
    });
    // No recorded case names the new symptom yet: the preview moves nothing and writes nothing.
    const a0 = await audits();
    const preview = await previewProposal(db(), BRAMBLEGATE, id);
    expect(preview.moved).toEqual([]);
    expect(await audits()).toBe(a0);
    await reviewProposal(db(), senior, id, {
      decision: "accept",
      comment: "Seen it.",
      symptomKind: "vibration",
    });
    expect(await version()).toBe(v0 + 1);
    const [made] = await db()
      .select()
      .from(symptoms)
      .where(
        and(
          eq(symptoms.workshopId, BRAMBLEGATE),
          eq(symptoms.name, "Steering wheel shimmy only after a wash"),
        ),
      );
    const [beside] = await db().select({ system: causes.system }).from(causes).where(eq(causes.id, BESIDE));
    expect(made).toMatchObject({ kind: "vibration", system: beside.system, leak: 0.02 });
    const [link] = await db()
      .select({ p: symptomLinks.p })
      .from(symptomLinks)
      .where(and(eq(symptomLinks.symptomId, made.id), eq(symptomLinks.causeId, BESIDE)));
    expect(link.p).toBe(0.15);
  });

  it("a missing cause proposed from a case is created when a senior accepts it, beside the one picked", async () => {
    const tech = await memberFor(db(), "priya-hale");
    const senior = await memberFor(db(), "tomas-varga");
    const v0 = await version();
    const { id } = await propose(db(), tech, {
      caseId: CASE,
      kind: "cause",
      symptomId: SYMPTOM,
      causeId: BESIDE,
      causeName: "Hub face rust under the disc",
      p: 0.6,
      note: "Disc true on the lathe, hub face scaled with rust: judder came back until cleaned.",
    });
    expect(await version()).toBe(v0);
    const [listed] = (await listProposals(db(), BRAMBLEGATE)).filter((p) => p.id === id);
    expect(listed).toMatchObject({ state: "open", kind: "cause", causeName: "Hub face rust under the disc" });
    const [beside] = await db()
      .select({ parentId: causes.parentId })
      .from(causes)
      .where(eq(causes.id, BESIDE));
    expect(listed.targetId).toBe(beside.parentId);

    const done = await reviewProposal(db(), senior, id, {
      decision: "accept",
      comment: "Seen it too.",
      priority: "soon",
    });
    expect(await version()).toBe(v0 + 1);
    const [made] = await db()
      .select()
      .from(causes)
      .where(and(eq(causes.workshopId, BRAMBLEGATE), eq(causes.name, "Hub face rust under the disc")));
    expect(made).toMatchObject({
      level: "failure_mode",
      parentId: beside.parentId,
      priority: "soon",
      baseRate: 1,
    });
    expect(done.causeId).toBe(made.id);
    const [link] = await db()
      .select({ p: symptomLinks.p })
      .from(symptomLinks)
      .where(and(eq(symptomLinks.symptomId, SYMPTOM), eq(symptomLinks.causeId, made.id)));
    expect(link.p).toBe(0.6);

    const a0 = await audits();
    const again = await refusal(reviewProposal(db(), senior, id, { decision: "reject", comment: "no" }));
    expect(again.status).toBe(409);
    expect(await audits()).toBe(a0);
  });

  it("a link proposal sets the strength on accept; a rejection changes the base not at all", async () => {
    const tech = await memberFor(db(), "priya-hale");
    const senior = await memberFor(db(), "tomas-varga");
    const cause = kbId("bramblegate", "cause", "brake_pad_noise");
    const a = await propose(db(), tech, {
      caseId: CASE,
      kind: "link",
      symptomId: SYMPTOM,
      causeId: cause,
      p: 0.35,
      note: "Judder from glazed pads, twice this month.",
    });
    const v0 = await version();
    await reviewProposal(db(), senior, a.id, {
      decision: "reject",
      comment: "Glazing shows as noise, not judder.",
    });
    expect(await version()).toBe(v0);
    const [rejected] = await db().select().from(kbProposals).where(eq(kbProposals.id, a.id));
    expect(rejected).toMatchObject({
      state: "rejected",
      reviewComment: "Glazing shows as noise, not judder.",
    });

    const b = await propose(db(), tech, {
      caseId: CASE,
      kind: "link",
      symptomId: SYMPTOM,
      causeId: cause,
      p: 0.35,
      note: "Seen again on a second car.",
    });
    await reviewProposal(db(), senior, b.id, { decision: "accept", comment: "" });
    const [link] = await db()
      .select({ p: symptomLinks.p })
      .from(symptomLinks)
      .where(and(eq(symptomLinks.symptomId, SYMPTOM), eq(symptomLinks.causeId, cause)));
    expect(link.p).toBe(0.35);
    expect(await version()).toBe(v0 + 1);
  });

  it("refuses a link to a tree node, another workshop's case, and another workshop's proposal", async () => {
    const tech = await memberFor(db(), "priya-hale");
    const component = (
      await db().select({ parentId: causes.parentId }).from(causes).where(eq(causes.id, BESIDE))
    )[0].parentId!;
    const base = { caseId: CASE, symptomId: SYMPTOM, p: 0.5, note: "A note long enough." };
    expect((await refusal(propose(db(), tech, { ...base, kind: "link", causeId: component }))).status).toBe(
      400,
    );
    const rowan = await memberFor(db(), "rowan-quill");
    expect((await refusal(propose(db(), rowan, { ...base, kind: "link", causeId: BESIDE }))).status).toBe(
      404,
    );
    const { id } = await propose(db(), tech, { ...base, kind: "link", causeId: BESIDE });
    const kit = await memberFor(db(), "kit-arbuthnot");
    expect((await refusal(reviewProposal(db(), kit, id, { decision: "accept", comment: "" }))).status).toBe(
      404,
    );
  });
});
