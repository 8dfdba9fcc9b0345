// The starter base's graded figures, grading scales and link conditions are sound: graded links
// belong to measurement checks, their four bands add up to 1 and their failing bands to the link's
// P(fail); a grading scale is a quantity of the rule's own kind; every link condition names an
// existing symptom link and a known condition; the generic code symptom's own unlisted figure.
import { describe, expect, it } from "vitest";
import { gradeReading, parseReading } from "~/measure";
import { CONDITIONS } from "~/reasoning";
import { starterKnowledgeBase as kb } from "../../../seeds/kb";
import { LINK_CONDITIONS } from "../../../seeds/kb/link-conditions";

const checkByKey = new Map(kb.checks.map((c) => [c.key, c]));

describe("graded figures", () => {
  const graded = kb.checkLinks.filter((l) => l.graded);

  it("are on a dozen or more links, all of measurement checks", () => {
    expect(graded.length).toBeGreaterThanOrEqual(12);
    for (const l of graded) expect(checkByKey.get(l.check)!.result.kind, l.check).toBe("measurement");
    expect(graded.some((l) => l.check === "pad_thickness" && l.cause === "brake_pads_metal")).toBe(true);
  });

  it("add up to 1 over the four bands and to P(fail) over the two failing ones", () => {
    for (const l of graded) {
      const g = l.graded!;
      expect(g.well_within + g.near + g.beyond + g.far_beyond, `${l.check} → ${l.cause}`).toBeCloseTo(1, 9);
      expect(g.beyond + g.far_beyond, `${l.check} → ${l.cause}`).toBeCloseTo(l.pFail, 9);
    }
  });

  it("say the backing plate reads far beyond more often than pads near the limit, and the reverse just beyond", () => {
    const g = (cause: string) =>
      graded.find((l) => l.check === "pad_thickness" && l.cause === cause)!.graded!;
    expect(g("brake_pads_metal").far_beyond).toBeGreaterThan(g("brake_pads_worn").far_beyond);
    expect(g("brake_pads_worn").beyond).toBeGreaterThan(g("brake_pads_metal").beyond);
  });
});

describe("grading scales", () => {
  it("are quantities of the rule's own kind, and make the zero-limit disc check gradable", () => {
    const scaled = kb.checks.filter((c) => c.result.kind === "measurement" && c.result.gradeScale);
    expect(scaled.length).toBeGreaterThanOrEqual(4);
    for (const c of scaled) {
      if (c.result.kind !== "measurement") continue;
      const scale = parseReading(c.result.gradeScale!);
      expect(scale.equalBase(parseReading(`1 ${c.result.unit}`)), c.key).toBe(true);
    }
    const disc = checkByKey.get("disc_min_thickness")!.result;
    if (disc.kind !== "measurement") throw new Error("disc_min_thickness is a measurement");
    expect(gradeReading(disc.rule, "-0.8 mm", disc.gradeScale).band).toBe("far_beyond");
  });
});

describe("link conditions", () => {
  it("name existing symptom links and known conditions only, and reach the merged base", () => {
    const links = new Set(kb.symptomLinks.map((l) => `${l.symptom}|${l.cause}`));
    for (const [key, when] of Object.entries(LINK_CONDITIONS)) {
      expect(links.has(key), key).toBe(true);
      for (const c of when) expect(CONDITIONS as readonly string[], key).toContain(c);
    }
    const lifter = kb.symptomLinks.find(
      (l) => l.symptom === "tick_top_end" && l.cause === "hydraulic_lifter_noisy",
    );
    expect(lifter?.when).toEqual(["cold", "at_idle"]);
  });
});

describe("the unknown fault's own figure", () => {
  it("is stated only where it differs, and is a probability", () => {
    const own = kb.symptoms.filter((s) => s.unlisted !== undefined);
    expect(own.map((s) => s.key)).toEqual(["trouble_code_stored"]);
    for (const s of own) expect(s.unlisted!).toBeGreaterThan(s.leak);
  });
});
