// A senior's change of one link's strength, against the real database: the link changes, a graded
// check link keeps its four bands summing to 1 with the failing two at the new strength, the
// knowledge-base version moves on with one audit row, and a cause of another workshop is not found.
import { and, count, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { auditLog, checkLinks, symptomLinks, workshops } from "~/db/schema";
import { causeWithLinks, setLinkStrength } from "~/kb/cause-links.server";
import { seedId } from "../../../seeds/ids";
import { kbId } from "../../../seeds/knowledge";
import { testDb } from "../../setup/integration-worker";
import { memberFor, refusal } from "../api/helpers";

const db = () => testDb();
const BRAMBLEGATE = seedId("workshop:bramblegate");
const version = async () =>
  (await db().select({ v: workshops.kbVersion }).from(workshops).where(eq(workshops.id, BRAMBLEGATE)))[0].v;
const audits = async () => (await db().select({ n: count() }).from(auditLog))[0].n;

describe("setting a link's strength", () => {
  it("changes a symptom link, moves the version on and audits it", async () => {
    const senior = await memberFor(db(), "tomas-varga");
    const causeId = kbId("bramblegate", "cause", "brake_pad_noise");
    const page = await causeWithLinks(db(), BRAMBLEGATE, causeId);
    const link = page.symptoms[0];
    const [v0, a0] = [await version(), await audits()];
    const done = await setLinkStrength(db(), senior, { link: "symptom", causeId, otherId: link.id, p: 0.6 });
    expect(done).toMatchObject({ before: link.p, after: 0.6, kbVersion: v0 + 1 });
    const [row] = await db()
      .select({ p: symptomLinks.p })
      .from(symptomLinks)
      .where(and(eq(symptomLinks.causeId, causeId), eq(symptomLinks.symptomId, link.id)));
    expect(row.p).toBe(0.6);
    expect(await version()).toBe(v0 + 1);
    expect(await audits()).toBe(a0 + 1);
  });

  it("keeps a graded check link's bands consistent", async () => {
    const senior = await memberFor(db(), "tomas-varga");
    const [graded] = await db()
      .select({ checkId: checkLinks.checkId, causeId: checkLinks.causeId, graded: checkLinks.graded })
      .from(checkLinks)
      .where(eq(checkLinks.workshopId, BRAMBLEGATE))
      .then((rows) => rows.filter((r) => r.graded));
    expect(graded).toBeDefined();
    await setLinkStrength(db(), senior, {
      link: "check",
      causeId: graded.causeId,
      otherId: graded.checkId,
      p: 0.5,
    });
    const [row] = await db()
      .select({ pFail: checkLinks.pFail, graded: checkLinks.graded })
      .from(checkLinks)
      .where(and(eq(checkLinks.causeId, graded.causeId), eq(checkLinks.checkId, graded.checkId)));
    const b = row.graded!;
    expect(row.pFail).toBe(0.5);
    expect(b.beyond + b.far_beyond).toBeCloseTo(0.5, 12);
    expect(b.well_within + b.near + b.beyond + b.far_beyond).toBeCloseTo(1, 12);
  });

  it("does not find another workshop's cause, and changes nothing", async () => {
    const other = await memberFor(db(), "kit-arbuthnot");
    const causeId = kbId("bramblegate", "cause", "brake_pad_noise");
    const page = await causeWithLinks(db(), BRAMBLEGATE, causeId);
    const [v0, a0] = [await version(), await audits()];
    const r = await refusal(
      setLinkStrength(db(), other, { link: "symptom", causeId, otherId: page.symptoms[0].id, p: 0.2 }),
    );
    expect(r.status).toBe(404);
    expect([await version(), await audits()]).toEqual([v0, a0]);
    expect((await refusal(causeWithLinks(db(), other.workshopId, causeId))).status).toBe(404);
  });
});
