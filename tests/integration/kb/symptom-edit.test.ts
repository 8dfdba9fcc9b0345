// A senior's edit of a symptom against the real database: a trouble code must parse as SAE J2012
// (a letter P, C, B or U and four characters), a name may not be another symptom's, and new
// synonyms reach Quick find's entries under the new version at once.
import { count } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { auditLog } from "~/db/schema";
import { kbVersion } from "~/kb/knowledge.server";
import { knowledgeEntries } from "~/kb/quick-find.server";
import { symptomWithLinks, updateSymptom } from "~/kb/symptom-edit.server";
import { seedId } from "../../../seeds/ids";
import { kbId } from "../../../seeds/knowledge";
import { testDb } from "../../setup/integration-worker";
import { memberFor, refusal } from "../api/helpers";

const db = () => testDb();
const BRAMBLEGATE = seedId("workshop:bramblegate");
const audits = async () => (await db().select({ n: count() }).from(auditLog))[0].n;

describe("editing a symptom", () => {
  it("refuses a malformed trouble code and a name already taken, changing nothing", async () => {
    const senior = await memberFor(db(), "tomas-varga");
    const { symptom } = await symptomWithLinks(
      db(),
      BRAMBLEGATE,
      kbId("bramblegate", "symptom", "squeal_braking"),
    );
    const edit = {
      name: symptom.name,
      synonyms: symptom.synonyms,
      kind: symptom.kind,
      code: symptom.code,
      conditions: symptom.conditions,
      leak: symptom.leak,
    };
    const [v0, a0] = [await kbVersion(db(), BRAMBLEGATE), await audits()];
    const code = await refusal(
      updateSymptom(db(), senior, symptom.id, { ...edit, kind: "trouble_code", code: "Q1234" }),
    );
    expect(code.status).toBe(400);
    const { symptom: other } = await symptomWithLinks(
      db(),
      BRAMBLEGATE,
      kbId("bramblegate", "symptom", "vibration_braking"),
    );
    const clash = await refusal(
      updateSymptom(db(), senior, symptom.id, { ...edit, name: other.name.toLowerCase() }),
    );
    expect(clash.status).toBe(400);
    expect([await kbVersion(db(), BRAMBLEGATE), await audits()]).toEqual([v0, a0]);
  });

  it("saves new synonyms, and Quick find's entries of the new version carry them", async () => {
    const senior = await memberFor(db(), "tomas-varga");
    const { symptom } = await symptomWithLinks(
      db(),
      BRAMBLEGATE,
      kbId("bramblegate", "symptom", "squeal_braking"),
    );
    const done = await updateSymptom(db(), senior, symptom.id, {
      name: symptom.name,
      synonyms: [...symptom.synonyms, "sings like a kettle when stopping"],
      kind: symptom.kind,
      code: symptom.code,
      conditions: symptom.conditions,
      leak: symptom.leak,
    });
    expect(done.changed).toEqual(["synonyms"]);
    const entries = await knowledgeEntries(db(), BRAMBLEGATE, await kbVersion(db(), BRAMBLEGATE));
    const entry = entries.find((e) => e.id === symptom.id)!;
    expect(JSON.stringify(entry)).toContain("sings like a kettle when stopping");
  });
});
