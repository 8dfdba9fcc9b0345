// A senior's edit of a check against the real database: a check whose steps involve brake fluid is
// refused without its brake-hydraulics caution, a measurement's rule must compile (app/measure),
// and a good edit saves with a new version and one audit row. Refusals change nothing.
import { count, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { auditLog, checks } from "~/db/schema";
import { checkWithLinks, updateCheck } from "~/kb/check-edit.server";
import { kbVersion } from "~/kb/knowledge.server";
import { seedId } from "../../../seeds/ids";
import { kbId } from "../../../seeds/knowledge";
import { testDb } from "../../setup/integration-worker";
import { memberFor, refusal } from "../api/helpers";

const db = () => testDb();
const BRAMBLEGATE = seedId("workshop:bramblegate");
const audits = async () => (await db().select({ n: count() }).from(auditLog))[0].n;
type Row = Awaited<ReturnType<typeof checkWithLinks>>["check"];
const asEdit = (c: Row) => ({
  name: c.name,
  instructions: c.instructions,
  tools: c.tools,
  minutes: c.minutes,
  consumablesCost: c.consumablesCost,
  access: c.access as never,
  skill: c.skill,
  cautions: c.cautions as never,
  quantity: c.quantity ?? undefined,
  unit: c.unit ?? undefined,
  rule: c.rule ?? undefined,
  failMeans: c.failMeans,
  falseAlarm: c.falseAlarm,
});

describe("editing a check", () => {
  it("refuses to drop the caution its steps call for, and a rule that does not compile, changing nothing", async () => {
    const senior = await memberFor(db(), "tomas-varga");
    const bleedId = kbId("bramblegate", "check", "brake_bleed_judgement");
    const { check: bleed } = await checkWithLinks(db(), BRAMBLEGATE, bleedId);
    const [v0, a0] = [await kbVersion(db(), BRAMBLEGATE), await audits()];
    const noCaution = await refusal(
      updateCheck(db(), senior, bleedId, {
        ...asEdit(bleed),
        cautions: bleed.cautions.filter((c) => c !== "brake_hydraulics") as never,
      }),
    );
    expect(noCaution.status).toBe(400);
    expect(noCaution.body.error).toMatch(/does not carry: brake hydraulics/);

    const [measured] = await db().select().from(checks).where(eq(checks.resultKind, "measurement")).limit(1);
    const badRule = await refusal(
      updateCheck(db(), senior, measured.id, { ...asEdit(measured), rule: "value <= <= 3 mm" }),
    );
    expect(badRule.status).toBe(400);
    expect(badRule.body.error).toMatch(/rule/i);
    expect([await kbVersion(db(), BRAMBLEGATE), await audits()]).toEqual([v0, a0]);
    expect((await checkWithLinks(db(), BRAMBLEGATE, bleedId)).check).toEqual(bleed);
  });

  it("saves a good edit with a new version and one audit row", async () => {
    const senior = await memberFor(db(), "tomas-varga");
    const id = kbId("bramblegate", "check", "brake_road_test");
    const { check } = await checkWithLinks(db(), BRAMBLEGATE, id);
    const [v0, a0] = [await kbVersion(db(), BRAMBLEGATE), await audits()];
    const done = await updateCheck(db(), senior, id, { ...asEdit(check), minutes: check.minutes + 5 });
    expect(done.changed).toEqual(["minutes"]);
    expect(await kbVersion(db(), BRAMBLEGATE)).toBe(v0 + 1);
    expect(await audits()).toBe(a0 + 1);
    // Another workshop's member does not find it.
    const kit = await memberFor(db(), "kit-arbuthnot");
    expect((await refusal(updateCheck(db(), kit, id, asEdit(check)))).status).toBe(404);
  });
});
