// Quick find and the trade's words: Porter stems, synonym pairs, negation and "only", trouble
// codes typed as codes, checks found by the words of their steps, conditions read off a complaint,
// and weak matches flagged instead of shown as the answer. Over the real starter knowledge base.
import { describe, expect, it } from "vitest";
import { buildIndex, parseQuery, porterStem, search, WEAK_QUALITY, type ScoredEntry } from "~/quick-find";
import { analyse } from "~/quick-find/analyse";
import { kbEntries } from "./fixtures";

const index = buildIndex(kbEntries);
const top = (q: string, kinds: ("symptom" | "check")[] = ["symptom"]): ScoredEntry | undefined =>
  search(index, q, { kinds })[0]?.items[0];
const concept = (w: string) => analyse(w)[0]?.concept;

describe("stemming (Porter 1980, through the stemmer package)", () => {
  it("gives the textbook stems", () => {
    // Porter, "An algorithm for suffix stripping", Program 14(3), 1980: worked examples of steps 1–5.
    expect(
      ["caresses", "ponies", "motoring", "conditional", "relational", "hopefully"].map(porterStem),
    ).toEqual(["caress", "poni", "motor", "condit", "relat", "hopefulli"]);
    expect(porterStem("jerking")).toBe(porterStem("jerks"));
    expect(porterStem("braking")).toBe("brake");
  });

  it("never stems codes or short words", () => {
    expect(porterStem("p0420")).toBe("p0420");
    expect(porterStem("abs")).toBe("abs");
  });

  it("lets an inflection reach a word written otherwise: “jerking” finds the symptom listed with “jerks”", () => {
    const a = top("car jerking when I accelerate");
    const b = top("car jerks when I accelerate");
    expect(a?.entry.id).toBe("misfire_load");
    expect(b?.entry.id).toBe(a?.entry.id);
  });
});

describe("the trade's synonym pairs", () => {
  it.each([
    ["lamp", "light"],
    ["judder", "shake"],
    ["knock", "clunk"],
    ["headlamp", "headlight"],
    ["handbrake", "parking brake"],
    ["whistle", "whoosh"],
    ["revs", "rpm"],
  ])("maps %s and %s to one concept", (a, b) => {
    expect(concept(a)).not.toBeNull();
    expect(concept(a)).toBe(concept(b));
  });

  it("finds a warning lamp by “light” and not the bulb-failure symptom", () => {
    expect(top("oil light flickers")?.entry.id).toBe("oil_pressure_lamp");
    expect(top("battery light on")?.entry.id).toBe("charge_light");
    expect(top("engine management light")?.entry.id).toBe("check_engine_light");
  });
});

describe("negation and “only”", () => {
  it("offers a negated complaint as absent: “no grinding”, “doesn't pull”", () => {
    expect(top("no grinding")).toMatchObject({ entry: { id: "grinding_braking" }, present: false });
    expect(top("doesn't pull to one side")).toMatchObject({ present: false });
    expect(parseQuery("no grinding").negated).toBe(true);
  });

  it("does not land “do not work from the driver's switches” on “work only from the driver's switches” as present", () => {
    const hit = top("rear windows do not work from the driver's switches");
    expect(hit?.entry.id === "rear_windows_driver_only" && hit.present !== false).toBe(false);
  });

  it("lands an “only” complaint said positively on the “only” symptom, present", () => {
    expect(top("back windows only work from the driver's switches")).toMatchObject({
      entry: { id: "rear_windows_driver_only" },
      present: true,
    });
  });

  it("keeps a negative symptom present when the words are negative too", () => {
    expect(top("back door won't open from the inside")).toMatchObject({
      entry: { id: "door_wont_open_inside" },
      present: true,
    });
    // a phrase of the synonym table is a complaint, not a negation
    expect(parseQuery("won't start").negated).toBe(false);
  });

  it("reads a negation only in the complaint's own clause", () => {
    expect(parseQuery("keeps losing coolant but there's no leak on the drive").negated).toBe(false);
    expect(parseQuery("no squeal and no grinding").negated).toBe(true);
  });
});

describe("trouble codes typed as codes (SAE J2012 format)", () => {
  it("lands a listed code on its own symptom, typed any usual way", () => {
    for (const q of ["P0171", "p0171", "P 0171", "code P0171 stored"])
      expect(top(q)).toMatchObject({ entry: { id: "dtc_p0171" }, code: "P0171" });
    expect(top("P0420")?.entry.id).toBe("dtc_p0420");
  });

  it("lands any other valid code on the generic symptom, with the code kept", () => {
    for (const code of ["P0325", "C0035", "B1000", "U0100", "P2015"])
      expect(top(code)).toMatchObject({ entry: { id: "trouble_code_stored" }, code, weak: false });
  });

  it("treats an invalid code as words (second character 4 is not in the standard)", () => {
    expect(parseQuery("P4123").codes).toEqual([]);
    expect(parseQuery("P0171 and P0174").codes).toEqual(["P0171", "P0174"]);
  });
});

describe("checks by the words of their steps", () => {
  it("finds the wheel-bearing check from “play at 12 and 6 o'clock”", () => {
    expect(top("play at 12 and 6 o'clock", ["check"])?.entry.id).toBe("wheel_bearing_rock_spin");
  });

  it("finds a check by a step's tool and action", () => {
    expect(top("soapy water slow leak", ["check"])?.entry.id).toBe("tyre_puncture_search");
  });
});

describe("conditions read off a complaint", () => {
  it("names braking and high speed in “judder only when braking from the motorway”", () => {
    expect(parseQuery("judder only when braking from the motorway").conditions).toEqual([
      "braking",
      "high_speed",
    ]);
    expect(parseQuery("ticks when cold").conditions).toEqual(["cold"]);
    expect(parseQuery("clunk over speed bumps turning").conditions).toEqual(["over_bumps", "turning"]);
  });
});

describe("weak matches", () => {
  it("flags a match covering a third of the query or less, and puts it after the real ones", () => {
    const hit = top("I clipped a kerb last month");
    expect(hit?.weak).toBe(true);
    expect(hit!.quality!).toBeLessThanOrEqual(WEAK_QUALITY);
    const groups = search(index, "squeal brake", { kinds: ["symptom"] });
    const flags = groups[0].items.map((i) => i.weak === true);
    expect(flags[0]).toBe(false);
    expect(flags.indexOf(true) === -1 || flags.slice(flags.indexOf(true)).every(Boolean)).toBe(true);
  });

  it("does not flag a full match", () => {
    const hit = top("grinding when braking");
    expect(hit).toMatchObject({ entry: { id: "grinding_braking" }, weak: false });
    expect(hit!.quality!).toBeGreaterThan(0.9);
  });
});
