// Quick find ranking over the real starter knowledge base and demo fleet: the complaints
// technicians type, in their words and the owner's, must land on the right entry first.
import { describe, expect, it } from "vitest";
import { buildIndex, caseEntry, ENTRY_KINDS, search, vehicleEntry, type ResultGroup } from "~/quick-find";
import { starterKnowledgeBase } from "../../../seeds/kb";
import { allEntries, caseByNumber, kbEntries, vehicleByReg } from "./fixtures";

const index = buildIndex(allEntries);
const first = (groups: ResultGroup[]) => groups[0]?.items[0]?.entry;
const ids = (groups: ResultGroup[], kind: string) =>
  groups.find((g) => g.kind === kind)?.items.map((i) => i.entry.id) ?? [];
const symptom = (key: string) => starterKnowledgeBase.symptoms.find((s) => s.key === key);

describe("complaints in the trade's and the owner's words", () => {
  it("finds the braking-vibration symptom first for “judder when braking”", () => {
    expect(symptom("vibration_braking")?.name).toMatch(/vibration.*braking/i);
    const groups = search(index, "judder when braking");
    expect(groups[0].kind).toBe("symptom");
    expect(first(groups)?.id).toBe("vibration_braking");
  });

  it.each([
    "shudder when braking",
    "shake when I brake",
    "steering wheel wobbles under braking",
    "vibration braking",
  ])("finds the braking-vibration symptom first for “%s” too", (q) =>
    expect(first(search(index, q))?.id).toBe("vibration_braking"),
  );

  it("finds the front clunk over bumps for “clunk bumps”, ahead of the underside rattle", () => {
    const list = ids(search(index, "clunk bumps"), "symptom");
    expect(list[0]).toBe("clunk_front_bumps");
    expect(list).toContain("rattle_underneath"); // "knock … over bumps" is the same concept, ranked lower
  });

  it("finds the driving pull first for “pulls left”, with the braking pull behind it", () => {
    const list = ids(search(index, "pulls left"), "symptom");
    expect(list[0]).toBe("pulls_driving");
    expect(list.indexOf("pull_braking")).toBeGreaterThan(0);
  });

  it.each(["drinks fuel", "poor economy", "mpg", "high consumption", "thirsty"])(
    "finds high fuel consumption first for “%s”",
    (q) => {
      expect(first(search(index, q))?.id).toBe("high_fuel_consumption");
    },
  );

  it("finds the dead-window symptoms for “windows dead” and “windows won't go down”", () => {
    for (const q of ["windows dead", "windows won't go down"]) {
      const top2 = ids(search(index, q), "symptom").slice(0, 2);
      expect(new Set(top2)).toEqual(new Set(["rear_windows_dead", "all_windows_dead"]));
    }
  });

  it("treats “won't start” and “no crank” as the same complaint", () => {
    expect(first(search(index, "won't start"))?.id).toBe("no_crank");
    expect(first(search(index, "no crank"))?.id).toBe("no_crank");
  });
});

describe("conditions are part of a symptom's meaning", () => {
  it("matches “under braking” from brake, braking and “when I brake”", () => {
    const braking = starterKnowledgeBase.symptoms
      .filter((s) => s.conditions.includes("under braking"))
      .map((s) => s.key);
    expect(braking.length).toBeGreaterThan(3);
    for (const q of ["brake", "braking", "when I brake"]) {
      const found = ids(search(index, q, { kinds: ["symptom"], limit: 50 }), "symptom");
      expect(found).toEqual(expect.arrayContaining(braking));
    }
  });

  it("uses the condition to pick between two squeals", () => {
    expect(first(search(index, "squeak when I brake"))?.id).toBe("squeal_braking");
  });

  it("reads the owner's “first thing in the morning” as a cold start", () => {
    const list = ids(search(index, "rough idle first thing in the morning"), "symptom");
    expect(list[0]).toBe("misfire_cold");
  });
});

describe("vehicles and cases", () => {
  it("finds a vehicle from a fragment from the middle of its VIN", () => {
    const vin = vehicleByReg("DEMO 101")!.vin;
    const groups = search(index, vin.slice(6, 12).toLowerCase());
    expect(groups[0].kind).toBe("vehicle");
    expect(first(groups)?.id).toBe("orlan-brisk");
  });

  it("finds no vehicle for a fragment no VIN contains", () => {
    expect(ids(search(index, "ZZ9Z99"), "vehicle")).toEqual([]);
  });

  it("finds a vehicle by registration, with or without the space", () => {
    for (const q of ["DEMO 101", "demo101"]) {
      const groups = search(index, q);
      expect(groups[0].kind).toBe("vehicle");
      expect(first(groups)?.id).toBe("orlan-brisk");
      expect(groups.some((g) => g.kind === "symptom")).toBe(false);
    }
  });

  it("treats “#1041” as a case number and shows only cases", () => {
    const groups = search(index, "#1041");
    expect(groups.map((g) => g.kind)).toEqual(["case"]);
    expect(first(groups)?.id).toBe(caseByNumber(1041)!.key);
  });

  it("finds a vehicle by its owner's name", () => {
    expect(first(search(index, "harriet"))?.id).toBe("orlan-brisk");
  });
});

describe("typing, typos and the empty box", () => {
  it("keeps the braking vibration first from “judder br” to the end of the word", () => {
    const q = "judder braking";
    for (let n = "judder br".length; n <= q.length; n++)
      expect(first(search(index, q.slice(0, n)))?.id, q.slice(0, n)).toBe("vibration_braking");
  });

  it("tolerates a missing letter and a swapped pair", () => {
    expect(first(search(index, "grindng brakes"))?.id).toBe("grinding_braking");
    expect(first(search(index, "vibraiton at speed"))?.id).toBe("vibration_speed");
  });

  it("still finds words typed without the space between them", () => {
    expect(first(search(index, "vibrationbraking"))?.id).toBe("vibration_braking");
  });

  it("lists recent items first, most recent first, when the box is empty", () => {
    const recentIds = ["b1", "clunk_front_bumps", "orlan-brisk"];
    const groups = search(index, "  ", { recentIds });
    expect(groups[0].kind).toBe("recent");
    expect(groups[0].items.map((i) => i.entry.id)).toEqual(recentIds);
    const later = groups.slice(1).flatMap((g) => g.items.map((i) => i.entry.id));
    expect(later.some((id) => recentIds.includes(id))).toBe(false);
  });

  it("nudges a recent item ahead of an otherwise equal one", () => {
    const plain = ids(search(index, "when I brake", { kinds: ["symptom"] }), "symptom");
    const last = plain[plain.length - 1];
    const nudged = ids(search(index, "when I brake", { kinds: ["symptom"], recentIds: [last] }), "symptom");
    expect(nudged.indexOf(last)).toBeLessThan(plain.indexOf(last));
  });
});

describe("grouping", () => {
  it("returns groups in the fixed kind order, each holding only its kind, best first", () => {
    const groups = search(index, "brake fluid");
    const kinds = groups.map((g) => g.kind);
    expect(kinds.length).toBeGreaterThanOrEqual(3);
    expect(
      [...kinds].sort((a, b) => ENTRY_KINDS.indexOf(a as never) - ENTRY_KINDS.indexOf(b as never)),
    ).toEqual(kinds);
    for (const g of groups) {
      expect(g.items.every((i) => i.entry.kind === g.kind)).toBe(true);
      const scores = g.items.map((i) => i.score);
      expect([...scores].sort((a, b) => b - a)).toEqual(scores);
    }
  });

  it("respects kinds and limit", () => {
    const groups = search(index, "brake", { kinds: ["check"], limit: 2 });
    expect(groups.map((g) => g.kind)).toEqual(["check"]);
    expect(groups[0].items).toHaveLength(2);
  });

  it("searches several indexes as one (knowledge base cached apart from the fleet)", () => {
    const kb = buildIndex(kbEntries);
    const fleet = buildIndex(allEntries.filter((e) => e.kind === "vehicle" || e.kind === "case"));
    const groups = search([kb, fleet], "orlan judder");
    expect(groups.map((g) => g.kind)).toContain("case");
    expect(first(search([kb, fleet], "judder when braking"))?.id).toBe("vibration_braking");
  });
});

describe("a number beside other words is a whole plate part", () => {
  // Invented plates and case numbers, as in the demo.
  const cases = [1019, 1012, 1041].map((number, i) =>
    caseEntry({ id: `case-${number}`, number, registration: ["DEMO 104", "DEMO 102", "DEMO 101"][i] }),
  );
  const fleet = buildIndex([
    ...cases,
    vehicleEntry({ id: "v101", registration: "DEMO 101", make: "Orlan", model: "Brisk" }),
  ]);

  it("“DEMO 101” finds that plate and its case, not cases #1019 and #1012", () => {
    const found = search(fleet, "DEMO 101").flatMap((g) => g.items.map((i) => i.entry.id));
    expect(found).toContain("v101");
    expect(found).toContain("case-1041");
    expect(found).not.toContain("case-1019");
    expect(found).not.toContain("case-1012");
  });

  it("a number typed alone, or after #, is still read as the start of a case number", () => {
    expect(ids(search(fleet, "#101"), "case")).toEqual(expect.arrayContaining(["case-1019", "case-1012"]));
    expect(ids(search(fleet, "1019"), "case")).toContain("case-1019");
  });
});
