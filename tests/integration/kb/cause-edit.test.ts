// A senior's edits of the cause tree against the real database: a failure mode moves under another
// component (its system follows), a wrong parent level or a clashing name is refused and changes
// nothing, and a retired cause leaves the ranking and the export while a case that names it keeps it.
import { count, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { loadCase } from "~/cases/case.server";
import { auditLog, causes } from "~/db/schema";
import { describeAudit } from "~/audit/describe";
import { retireCause, updateCause } from "~/kb/cause-edit.server";
import { loadKnowledge, kbVersion } from "~/kb/knowledge.server";
import { exportKnowledge } from "~/kb/transfer.server";
import { seedId } from "../../../seeds/ids";
import { kbId } from "../../../seeds/knowledge";
import { testDb } from "../../setup/integration-worker";
import { memberFor, refusal } from "../api/helpers";

const db = () => testDb();
const BRAMBLEGATE = seedId("workshop:bramblegate");
const row = async (id: string) => (await db().select().from(causes).where(eq(causes.id, id)))[0];
const edit = (c: Awaited<ReturnType<typeof row>>) => ({
  name: c.name,
  parentId: c.parentId,
  description: c.description,
  ownerDescription: c.ownerDescription,
  ifLeft: c.ifLeft,
  baseRate: c.baseRate ?? undefined,
  repairMinutes: c.repairMinutes ?? undefined,
  partsCost: c.partsCost ?? undefined,
  priority: c.priority ?? undefined,
});

describe("editing the cause tree", () => {
  it("narrows a failure mode to the vehicles it applies to; the engine reads it and its history says it", async () => {
    const senior = await memberFor(db(), "tomas-varga");
    const id = kbId("bramblegate", "cause", "brake_disc_worn_thin");
    const before = await row(id);
    const applicability = { fuel: ["diesel" as const], minKm: 96_561 };
    const done = await updateCause(db(), senior, id, { ...edit(before), applicability });
    expect(done.changed).toEqual(["applicability"]);
    const kb = await loadKnowledge(db(), BRAMBLEGATE, done.kbVersion!);
    expect(kb.causes.find((c) => c.id === id)?.applicability).toEqual(applicability);
    // Saved again as it is (jsonb keeps keys in its own order): nothing changed.
    const again = await updateCause(db(), senior, id, {
      ...edit(before),
      applicability: { minKm: 96_561, fuel: ["diesel"] },
    });
    expect(again.changed).toEqual([]);
    const [entry] = await db().select().from(auditLog).where(eq(auditLog.entityId, id)).orderBy(auditLog.id);
    expect(describeAudit(entry).text).toBe(
      `edited the cause “${before.name}”: changed which vehicles it applies to`,
    );
  });

  it("moves a failure mode under another component, with a new version and an audit line in words", async () => {
    const senior = await memberFor(db(), "tomas-varga");
    const id = kbId("bramblegate", "cause", "brake_pad_noise");
    const before = await row(id);
    const [other] = await db()
      .select({ id: causes.id, name: causes.name, system: causes.system })
      .from(causes)
      .where(eq(causes.level, "component"))
      .then((rows) => rows.filter((r) => r.id !== before.parentId && r.system !== before.system));
    const v0 = await kbVersion(db(), BRAMBLEGATE);
    const done = await updateCause(db(), senior, id, { ...edit(before), parentId: other.id, baseRate: 5 });
    expect(done.changed).toEqual(["parentId", "baseRate"]);
    const after = await row(id);
    expect(after).toMatchObject({ parentId: other.id, system: other.system, baseRate: 5 });
    expect(await kbVersion(db(), BRAMBLEGATE)).toBe(v0 + 1);
    const [entry] = await db().select().from(auditLog).where(eq(auditLog.entityId, id));
    expect(describeAudit(entry).text).toBe(
      `edited the cause “${before.name}”: moved it under “${other.name}”, changed the base rate from ${before.baseRate} to 5`,
    );
  });

  it("refuses a failure mode under a system, and a name its new siblings have, changing nothing", async () => {
    const senior = await memberFor(db(), "tomas-varga");
    const id = kbId("bramblegate", "cause", "brake_disc_runout_dtv");
    const before = await row(id);
    const parent = await row(before.parentId!);
    const audits = (await db().select({ n: count() }).from(auditLog))[0].n;
    expect(
      (await refusal(updateCause(db(), senior, id, { ...edit(before), parentId: parent.parentId }))).status,
    ).toBe(400);
    const [sibling] = await db()
      .select({ name: causes.name })
      .from(causes)
      .where(eq(causes.parentId, before.parentId!))
      .then((rows) => rows.filter((r) => r.name !== before.name));
    expect(
      (await refusal(updateCause(db(), senior, id, { ...edit(before), name: sibling.name.toUpperCase() })))
        .status,
    ).toBe(400);
    expect(await row(id)).toEqual(before);
    expect((await db().select({ n: count() }).from(auditLog))[0].n).toBe(audits);
  });

  it("retires a cause: out of the ranking and the export, still named on a case that concluded with it", async () => {
    const senior = await memberFor(db(), "tomas-varga");
    // Demo case b5 is closed; retire its confirmed cause.
    const b5 = await loadCase(db(), senior, seedId("case:b5"));
    const causeId = b5.conclusionCauseId!;
    const name = b5.conclusionCause!;
    await retireCause(db(), senior, causeId);
    const kb = await loadKnowledge(db(), BRAMBLEGATE, await kbVersion(db(), BRAMBLEGATE));
    expect(kb.causes.some((c) => c.id === causeId)).toBe(false);
    expect(kb.symptomLinks.some((l) => l.causeId === causeId)).toBe(false);
    const doc = await exportKnowledge(db(), BRAMBLEGATE);
    expect(doc.causes.some((c) => c.name === name)).toBe(false);
    expect((await loadCase(db(), senior, seedId("case:b5"))).conclusionCause).toBe(name);
    expect((await refusal(retireCause(db(), senior, causeId))).status).toBe(409);
    const component = (await row(kbId("bramblegate", "cause", "brake_disc_runout_dtv"))).parentId!;
    expect((await refusal(retireCause(db(), senior, component))).status).toBe(409);
  });
});
