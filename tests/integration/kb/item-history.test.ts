// One item's history against the real database: a symptom's own edit and the link changes that
// name it are both in it, newest first, in words with before and after; another workshop's
// entries never are.
import { describe, expect, it } from "vitest";
import { itemHistory } from "~/audit/item-history.server";
import { setLinkStrength } from "~/kb/cause-links.server";
import { symptomWithLinks, updateSymptom } from "~/kb/symptom-edit.server";
import { seedId } from "../../../seeds/ids";
import { kbId } from "../../../seeds/knowledge";
import { testDb } from "../../setup/integration-worker";
import { memberFor } from "../api/helpers";

const db = () => testDb();
const BRAMBLEGATE = seedId("workshop:bramblegate");
const GRINDING = kbId("bramblegate", "symptom", "grinding_braking");

describe("an item's history", () => {
  it("holds the symptom's edit and a link that names it, newest first, with before and after", async () => {
    const tomas = await memberFor(db(), "tomas-varga");
    const { symptom, pointsTo } = await symptomWithLinks(db(), BRAMBLEGATE, GRINDING);
    await updateSymptom(db(), tomas, GRINDING, {
      name: symptom.name,
      synonyms: [...symptom.synonyms, "rasping when stopping"],
      kind: symptom.kind,
      code: symptom.code,
      conditions: symptom.conditions,
      leak: symptom.leak,
    });
    const cause = pointsTo[0];
    await setLinkStrength(db(), tomas, { link: "symptom", causeId: cause.id, otherId: GRINDING, p: 0.15 });

    const lines = await itemHistory(db(), BRAMBLEGATE, GRINDING);
    expect(lines).toHaveLength(2);
    const [link, edit] = lines;
    expect(link.actor).toBe("Tomas Varga");
    expect(link.text).toMatch(/to now and then \(15%\)/);
    expect(link.changes).toEqual([
      {
        what: `How often “${cause.name}” shows as “${symptom.name}”`,
        before: expect.any(String),
        after: "now and then (15%)",
      },
    ]);
    expect(edit.changes[0].what).toBe("The words people use for it");
    expect(edit.changes[0].after).toMatch(/rasping when stopping$/);
    // The cause's history holds the link change too.
    expect((await itemHistory(db(), BRAMBLEGATE, cause.id)).map((l) => l.text)).toEqual([link.text]);
    // Another workshop sees none of it.
    expect(await itemHistory(db(), seedId("workshop:saltmarsh"), GRINDING)).toEqual([]);
  });
});
