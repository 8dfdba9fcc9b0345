// The diagnostic benchmark's cases (tests/bench/diagnosis) are sound data: enough of them, over
// every system, in people's own words (never a knowledge-base name or synonym), naming only keys
// that exist, with readings that parse against their check's rule. And on every case the check
// plan costs no more than cheapest-first. The figures themselves are printed by the benchmark.
import { describe, expect, it } from "vitest";
import { evaluateRule } from "~/measure";
import { normaliseText } from "~/quick-find";
import { starterKnowledgeBase as kb } from "../../../seeds/kb";
import { SYSTEMS } from "../../../seeds/kb/types";
import { benchCases } from "../../bench/diagnosis/index";
import { runCase } from "../../bench/diagnosis/run";
import { parseDtc } from "~/measure/dtc";

const symptomKeys = new Set(kb.symptoms.map((s) => s.key));
const leafKeys = new Set(kb.causes.filter((c) => c.level === "failure_mode").map((c) => c.key));
const checkByKey = new Map(kb.checks.map((c) => [c.key, c]));

describe("diagnostic benchmark cases", () => {
  it("has at least 80 cases over every system, at least 10 of them with a cause the base lacks", () => {
    expect(benchCases.length).toBeGreaterThanOrEqual(80);
    expect(benchCases.filter((c) => "missing" in c.answer).length).toBeGreaterThanOrEqual(10);
    for (const system of SYSTEMS)
      expect(
        benchCases.some((c) => c.system === system),
        system,
      ).toBe(true);
    expect(new Set(benchCases.map((c) => c.id)).size).toBe(benchCases.length);
  });

  it("gives every case vehicle facts, phrases, absent symptoms somewhere, findings and readings with units", () => {
    for (const c of benchCases) {
      expect(c.vehicle.km, c.id).toBeGreaterThan(0);
      expect(c.said.length, c.id).toBeGreaterThan(0);
    }
    expect(benchCases.filter((c) => c.said.some((p) => !p.present)).length).toBeGreaterThanOrEqual(10);
    expect(benchCases.filter((c) => c.findings.some((f) => f.reading)).length).toBeGreaterThanOrEqual(20);
    expect(benchCases.filter((c) => c.findings.length > 0).length).toBeGreaterThanOrEqual(
      benchCases.length - 2,
    );
  });

  it("writes phrases in people's words: none equals a knowledge-base name or synonym (a bare trouble code is the standard's own name)", () => {
    const kbText = new Set<string>();
    for (const s of kb.symptoms)
      for (const t of [s.name, ...s.synonyms, ...s.conditions]) kbText.add(normaliseText(t));
    for (const c of [...kb.causes, ...kb.checks]) kbText.add(normaliseText(c.name));
    for (const c of benchCases) {
      for (const p of c.said) {
        if (parseDtc(p.text).valid) continue; // "P0420" is how every scan tool shows it (SAE J2012)
        expect(kbText.has(normaliseText(p.text)), `${c.id}: "${p.text}"`).toBe(false);
      }
    }
  });

  it("names only symptoms, failure modes and checks that exist, and readings that parse against their rule", () => {
    for (const c of benchCases) {
      for (const p of c.said)
        if (p.means !== null) expect(symptomKeys.has(p.means), `${c.id}: ${p.means}`).toBe(true);
      if ("cause" in c.answer) expect(leafKeys.has(c.answer.cause), `${c.id}: ${c.answer.cause}`).toBe(true);
      else expect(c.answer.missing.length, c.id).toBeGreaterThan(5);
      for (const f of c.findings) {
        const check = checkByKey.get(f.check);
        expect(check, `${c.id}: ${f.check}`).toBeDefined();
        expect(
          Boolean(f.result) !== Boolean(f.reading),
          `${c.id}: ${f.check} has a result or a reading`,
        ).toBe(true);
        if (f.reading) {
          const result = check!.result;
          expect(result.kind, `${c.id}: ${f.check}`).toBe("measurement");
          if (result.kind === "measurement")
            expect(() => evaluateRule(result.rule, f.reading!), `${c.id}: ${f.reading}`).not.toThrow();
        }
      }
    }
  });

  it("plans no case's checks at a higher expected cost than cheapest-first, from the history or with the findings", () => {
    for (const c of benchCases) {
      for (const p of runCase(c).plan) expect(p.expected, c.id).toBeLessThanOrEqual(p.cheapest * (1 + 1e-12));
    }
  });
});
