// Rows → entries: what each kind of row contributes to being found.
import { describe, expect, it } from "vitest";
import { caseEntry, entriesFromKnowledgeBase, vehicleEntry } from "~/quick-find";
import { starterKnowledgeBase } from "../../../seeds/kb";

const entries = entriesFromKnowledgeBase(starterKnowledgeBase);
const byId = new Map(entries.map((e) => [e.id, e]));

describe("entries from the knowledge base", () => {
  it("has one entry per symptom, cause and check, with unique ids", () => {
    const { symptoms, causes, checks } = starterKnowledgeBase;
    expect(entries).toHaveLength(symptoms.length + causes.length + checks.length);
    expect(byId.size).toBe(entries.length);
  });

  it("keeps a symptom's synonyms and conditions as keywords", () => {
    const s = starterKnowledgeBase.symptoms.find((x) => x.key === "vibration_braking")!;
    const e = byId.get("vibration_braking")!;
    expect(e.kind).toBe("symptom");
    expect(e.keywords).toEqual([...s.synonyms, ...s.conditions]);
    expect(e.subtitle).toContain("Brakes");
  });

  it("names a cause's component and system from the cause tree", () => {
    const leaf = starterKnowledgeBase.causes.find((c) => c.key === "brake_caliper_sticking")!;
    const parent = starterKnowledgeBase.causes.find((c) => c.key === leaf.parentKey)!;
    expect(byId.get(leaf.key)?.subtitle).toBe(`Failure mode · ${parent.name} · Brakes`);
  });
});

describe("vehicle and case entries", () => {
  it("lets a vehicle be found by registration, VIN and owner", () => {
    const e = vehicleEntry({
      id: "v1",
      registration: "DEMO 101",
      vin: "9RL0R1BR4N4100231",
      make: "Orlan",
      model: "Brisk",
      year: 2019,
      ownerName: "Harriet Pennock",
    });
    expect(e.title).toBe("DEMO 101 · Orlan Brisk 2019");
    expect(e.keywords).toEqual(["DEMO 101", "9RL0R1BR4N4100231", "Harriet Pennock"]);
  });

  it("titles a case with its number and vehicle, and keeps the complaint as subtitle", () => {
    const e = caseEntry({
      id: "c1",
      number: 1041,
      registration: "DEMO 101",
      vehicle: "Orlan Brisk",
      complaint: "Shakes when I brake.",
    });
    expect(e.title).toBe("#1041 · DEMO 101 · Orlan Brisk");
    expect(e.subtitle).toBe("Shakes when I brake.");
    expect(e.keywords).toContain("1041");
  });
});
