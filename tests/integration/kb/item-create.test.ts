// New symptoms and checks made in the app, against the real database: each is saved with a key of
// its own, a new version and an audit line, and Quick find's source (the version's symptoms) has it
// at once; a malformed trouble code (SAE J2012), a lifting check without its caution (the hazard
// rules of app/domain/hazards.ts) and a clashing name are refused at their fields, writing nothing.
import { count, eq } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { auditLog, checks, symptoms } from "~/db/schema";
import { addCheck } from "~/kb/check-edit.server";
import { kbVersion, loadKnowledge } from "~/kb/knowledge.server";
import { addSymptom } from "~/kb/symptom-edit.server";
import { seedId } from "../../../seeds/ids";
import { testDb } from "../../setup/integration-worker";
import { memberFor, refusal } from "../api/helpers";

const db = () => testDb();
const BRAMBLEGATE = seedId("workshop:bramblegate");
const writes = async () => [
  await kbVersion(db(), BRAMBLEGATE),
  (await db().select({ n: count() }).from(auditLog))[0].n,
  (await db().select({ n: count() }).from(symptoms))[0].n,
  (await db().select({ n: count() }).from(checks))[0].n,
];
const symptom = {
  name: "Clunk from the rear over speed humps",
  synonyms: ["knock at the back over bumps"],
  kind: "noise" as const,
  code: null,
  conditions: ["over bumps"],
  leak: 0.01,
  system: "suspension_steering" as const,
};
const check = {
  name: "Rear anti-roll bar link play by hand",
  instructions: [
    "Raise the car on the ramp and support it.",
    "Rock each rear drop link by hand and look for play.",
  ],
  tools: ["ramp", "pry bar"],
  minutes: 10,
  consumablesCost: 0,
  access: ["ramp" as const],
  skill: "technician" as const,
  cautions: ["lifting" as const],
  failMeans: "Play or a knock felt at the link.",
  falseAlarm: 0.05,
  resultKind: "pass_fail" as const,
};

describe("new knowledge-base items", () => {
  it("adds a symptom and a check, each with a new version the engine reads", async () => {
    const tomas = await memberFor(db(), "tomas-varga");
    const s = await addSymptom(db(), tomas, symptom);
    const k = await addCheck(db(), tomas, check);
    expect(k.kbVersion).toBe(s.kbVersion + 1);
    const kb = await loadKnowledge(db(), BRAMBLEGATE, k.kbVersion);
    expect(kb.symptoms.find((x) => x.id === s.id)).toMatchObject({
      name: symptom.name,
      synonyms: symptom.synonyms,
    });
    expect(kb.checks.find((x) => x.id === k.id)).toMatchObject({ name: check.name, cautions: ["lifting"] });
    const [row] = await db().select({ key: symptoms.key }).from(symptoms).where(eq(symptoms.id, s.id));
    expect(row.key).toMatch(/^clunk_from_the_rear_over_speed_humps_[0-9a-f]{8}$/);
  });

  it("refuses a malformed code, a lifting check without its caution and a clashing name, writing nothing", async () => {
    const tomas = await memberFor(db(), "tomas-varga");
    const before = await writes();
    const code = await refusal(
      addSymptom(db(), tomas, { ...symptom, name: "Odd code", kind: "trouble_code", code: "Q1234" }),
    );
    expect(code.status).toBe(400);
    expect(Object.keys((code.body as { errors: object }).errors)).toEqual(["code"]);
    const hazard = await refusal(
      addCheck(db(), tomas, { ...check, name: "Another link check", cautions: [] }),
    );
    expect(hazard.status).toBe(400);
    expect((hazard.body as { errors: Record<string, string[]> }).errors.cautions[0]).toMatch(/caution/);
    const [existing] = await db()
      .select({ name: symptoms.name })
      .from(symptoms)
      .where(eq(symptoms.workshopId, BRAMBLEGATE))
      .limit(1);
    const clash = await refusal(addSymptom(db(), tomas, { ...symptom, name: existing.name.toUpperCase() }));
    expect(clash.status).toBe(400);
    expect(await writes()).toEqual(before);
  });
});
