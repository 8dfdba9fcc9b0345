// Knowledge-base versions against the real database: every change keeps its version whole; a case
// ranked under version N shows the same ranking after N+1 is made, and is ranked with N+1 only
// when someone working on it asks; evidence that only a newer version knows is set aside, not a 5xx.
import { and, count, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { loadCase, loadCaseForChange } from "~/cases/case.server";
import { caseView } from "~/cases/diagnosis.server";
import { recordObservation } from "~/cases/evidence.server";
import { moveToNewestKnowledge } from "~/cases/knowledge-version.server";
import { openCase } from "~/cases/open-case.server";
import type { CurrentMember } from "~/auth/guards.server";
import { auditLog, kbVersions, symptoms, workshops } from "~/db/schema";
import { setLinkStrength } from "~/kb/cause-links.server";
import { keepCurrentVersion, keptKnowledge, listVersions, nextKbVersion } from "~/kb/version.server";
import { seedId } from "../../../seeds/ids";
import { kbId } from "../../../seeds/knowledge";
import { testDb } from "../../setup/integration-worker";
import { memberFor, refusal } from "../api/helpers";

const db = () => testDb();
const BRAMBLEGATE = seedId("workshop:bramblegate");
const JUDDER = kbId("bramblegate", "symptom", "vibration_braking");
const version = async () =>
  (await db().select({ v: workshops.kbVersion }).from(workshops).where(eq(workshops.id, BRAMBLEGATE)))[0].v;
const ranking = async (member: CurrentMember, id: string) => {
  const view = await caseView(db(), member, await loadCase(db(), member, id));
  return {
    version: view.diagnosis.knowledge.version,
    setAside: view.diagnosis.knowledge.setAside,
    causes: view.diagnosis.causes.map((c) => [c.id, c.probability] as const),
  };
};

async function judderCase(member: CurrentMember) {
  const opened = await openCase(db(), member, {
    vehicleId: seedId("vehicle:orlan-brisk"),
    mileageKm: 70_000,
    complaint: "Judder through the pedal when braking from speed.",
  });
  await recordObservation(db(), member, await loadCaseForChange(db(), member, opened.id), {
    symptomId: JUDDER,
    present: true,
    source: "owner",
  });
  return opened.id;
}

describe("knowledge-base versions", () => {
  it("keeps a case's ranking under its version after a change, and re-ranks it with the newer one when asked", async () => {
    const [priya, tomas] = [await memberFor(db(), "priya-hale"), await memberFor(db(), "tomas-varga")];
    const id = await judderCase(priya);
    const v0 = await version();
    const before = await ranking(priya, id);
    expect(before.version).toBe(v0);
    expect((await loadCase(db(), priya, id)).kbVersion).toBe(v0);
    // The senior says the top cause shows the judder only rarely: version v0 + 1.
    const top = before.causes[0][0];
    const done = await setLinkStrength(db(), tomas, {
      link: "symptom",
      causeId: top,
      otherId: JUDDER,
      p: 0.05,
    });
    expect(done.kbVersion).toBe(v0 + 1);
    // The case is ranked exactly as it was.
    expect(await ranking(priya, id)).toEqual(before);
    // Asked, it is ranked with the new version: the weakened cause drops.
    const moved = await moveToNewestKnowledge(db(), priya, await loadCaseForChange(db(), priya, id));
    expect(moved).toEqual({ from: v0, to: v0 + 1, moved: true });
    const after = await ranking(priya, id);
    expect(after.version).toBe(v0 + 1);
    const p = (r: typeof before) => r.causes.find(([c]) => c === top)?.[1] ?? 0;
    expect(p(after)).toBeLessThan(p(before));
    // The move is in the case's history; asking again changes nothing.
    const [{ n }] = await db()
      .select({ n: count() })
      .from(auditLog)
      .where(and(eq(auditLog.action, "case.kb_version"), eq(auditLog.entityId, id)));
    expect(n).toBe(1);
    const again = await moveToNewestKnowledge(db(), priya, await loadCaseForChange(db(), priya, id));
    expect(again.moved).toBe(false);
  });

  it("keeps each version whole with who made it and why", async () => {
    const tomas = await memberFor(db(), "tomas-varga");
    const v = await version();
    const kept = await keptKnowledge(db(), BRAMBLEGATE, v);
    expect(kept?.symptoms.length).toBeGreaterThanOrEqual(110);
    const [newest] = await listVersions(db(), BRAMBLEGATE, 1);
    expect(newest.version).toBe(v);
    expect(newest.summary).not.toBe("");
    // A change made in the app names its maker.
    const link = kept!.symptomLinks.find((l) => l.symptomId === JUDDER)!;
    await setLinkStrength(db(), tomas, { link: "symptom", causeId: link.causeId, otherId: JUDDER, p: 0.35 });
    const [made] = await listVersions(db(), BRAMBLEGATE, 1);
    expect(made).toMatchObject({ version: v + 1, madeBy: "Tomas Varga" });
    expect(made.summary).toMatch(/sometimes/);
  });

  it("makes a new version after a seed only when the rows differ from the kept one", async () => {
    const v = await version();
    await db().transaction((tx) => keepCurrentVersion(tx, BRAMBLEGATE, "re-seed, nothing new"));
    expect(await version()).toBe(v);
    await db().update(symptoms).set({ leak: 0.02 }).where(eq(symptoms.id, JUDDER));
    await db().transaction((tx) => keepCurrentVersion(tx, BRAMBLEGATE, "re-seed with a changed symptom"));
    expect(await version()).toBe(v + 1);
    const [{ n }] = await db()
      .select({ n: count() })
      .from(kbVersions)
      .where(and(eq(kbVersions.workshopId, BRAMBLEGATE), eq(kbVersions.version, v + 1)));
    expect(n).toBe(1);
  });

  it("sets aside evidence the case's version does not know, and counts it", async () => {
    const priya = await memberFor(db(), "priya-hale");
    const id = await judderCase(priya);
    // A symptom added after the case opened (version v + 1).
    const [added] = await db().transaction(async (tx) => {
      const rows = await tx
        .insert(symptoms)
        .values({
          workshopId: BRAMBLEGATE,
          key: "test_new_squeal",
          name: "Squeal only on the first stop",
          system: "brakes",
          kind: "noise",
          leak: 0.01,
        })
        .returning({ id: symptoms.id });
      await nextKbVersion(tx, BRAMBLEGATE, "Symptom added");
      return rows;
    });
    const before = await ranking(priya, id);
    await recordObservation(db(), priya, await loadCaseForChange(db(), priya, id), {
      symptomId: added.id,
      present: true,
      source: "technician",
    });
    const after = await ranking(priya, id);
    expect(after).toEqual({ ...before, setAside: 1 });
    await moveToNewestKnowledge(db(), priya, await loadCaseForChange(db(), priya, id));
    expect((await ranking(priya, id)).setAside).toBe(0);
  });

  it("lets only someone who works on an open case move it on", async () => {
    const [priya, advisor] = [await memberFor(db(), "priya-hale"), await memberFor(db(), "dana-reyes")];
    const id = await judderCase(priya);
    const c = await loadCaseForChange(db(), advisor, id);
    expect((await refusal(moveToNewestKnowledge(db(), advisor, c))).status).toBe(403);
  });
});
