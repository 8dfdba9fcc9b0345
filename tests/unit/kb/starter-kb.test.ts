// Integrity of the starter knowledge base: shape, tree, links, probabilities, measurement rules,
// safety cautions, limit sources, and the demo journeys the product is shown with.
import { readdirSync, readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { all, create, type MathNode } from "mathjs";
import { describe, expect, it } from "vitest";
import { HAZARD_WORDS, missingCautions } from "~/domain/hazards";
import { parseDtc } from "../../../app/measure/dtc";
import { starterKnowledgeBase as kb } from "../../../seeds/kb/index";
import {
  ACCESS,
  CAUTIONS,
  type CauseSeed,
  type CheckSeed,
  DRIVETRAINS,
  FUEL_TYPES,
  PRIORITIES,
  SKILLS,
  SYMPTOM_KINDS,
  SYSTEMS,
} from "../../../seeds/kb/types";

const m = create(all);
const KB_DIR = fileURLToPath(new URL("../../../seeds/kb/", import.meta.url));
const DOC = fileURLToPath(new URL("../../../docs/knowledge-base.md", import.meta.url));

const causeByKey = new Map(kb.causes.map((c) => [c.key, c]));
const leaves = kb.causes.filter((c) => c.level === "failure_mode");
const checkByKey = new Map(kb.checks.map((c) => [c.key, c]));
const symptomByKey = new Map(kb.symptoms.map((s) => [s.key, s]));

function ancestors(key: string): string[] {
  const out: string[] = [];
  let cur = causeByKey.get(key);
  while (cur?.parentKey) {
    out.push(cur.parentKey);
    cur = causeByKey.get(cur.parentKey);
  }
  return out;
}
/** Checks bearing on a leaf directly or through one of its ancestors. */
function checksFor(leafKey: string): string[] {
  const keys = new Set([leafKey, ...ancestors(leafKey)]);
  return kb.checkLinks.filter((l) => keys.has(l.cause)).map((l) => l.check);
}
const linksOf = (symptom: string) => kb.symptomLinks.filter((l) => l.symptom === symptom);
const text = (c: CheckSeed) => [c.name, ...c.instructions, c.result.failMeans].join(" ");
const measurementChecks = kb.checks.filter((c) => c.result.kind === "measurement");
/** Trouble-code symptoms named by their code; the one generic "trouble code stored" symptom has none. */
const troubleCodeSymptoms = kb.symptoms.filter(
  (s) => s.kind === "trouble_code" && s.key !== "trouble_code_stored",
);
/** What the technician reads and does: the name and the steps (not the fail text, which may name other parts). */
const doing = (c: CheckSeed) => [c.name, ...c.instructions].join(" ");
const kbSources = () =>
  readdirSync(KB_DIR)
    .filter((f) => f.endsWith(".ts") && f !== "types.ts" && f !== "build.ts")
    .map((f) => readFileSync(KB_DIR + f, "utf8"));
/**
 * Generic by the parser (second character 0), or a powertrain P2xxx code: the parser leaves the
 * second character 2 to "system and edition", and SAE J2012 assigns P2xxx to generic powertrain
 * codes (from memory, not verified here) — the particulate-filter codes P2002 / P2463 are such.
 */
function isGeneric(code: string): boolean {
  const parsed = parseDtc(code);
  if (!parsed.valid) return false;
  return parsed.scope === "generic" || (parsed.system === "powertrain" && parsed.code[1] === "2");
}
// The generic titles SOURCES.md quotes (secondary); any other code's title is "from memory".
const CODES_IN_SOURCES = new Set(["P0171", "P0172", "P0300", "P0301", "P0420", "P0117", "P0118"]);

// ---- measurement-rule analysis with mathjs ----
type Bound = { side: "upper" | "lower"; limit: number };
const FLIP: Record<string, string> = { "<=": ">=", ">=": "<=", "<": ">", ">": "<" };

function sample(x: number, unit: string) {
  return unit === "" ? x : m.unit(x, unit);
}
function evaluate(rule: string, value: unknown): unknown {
  return m.parse(rule).compile().evaluate({ value });
}
function boundsOf(rule: string, unit: string): Bound[] {
  const bounds: Bound[] = [];
  m.parse(rule).traverse((node: MathNode) => {
    if (!m.isOperatorNode(node) || !["<=", ">=", "<", ">", "==", "!="].includes(node.op)) return;
    const [a, b] = node.args;
    const valueLeft = m.isSymbolNode(a) && a.name === "value";
    const valueRight = m.isSymbolNode(b) && b.name === "value";
    if (valueLeft === valueRight) throw new Error(`comparison without exactly one 'value' in ${rule}`);
    const op = valueLeft ? node.op : FLIP[node.op];
    if (!op || op === "==" || op === "!=") throw new Error(`equality comparisons are not limits: ${rule}`);
    const limitValue = (valueLeft ? b : a).compile().evaluate({});
    let limit: number;
    if (unit === "") {
      if (typeof limitValue !== "number") throw new Error(`unitless check with a unit in its rule: ${rule}`);
      limit = limitValue;
    } else {
      if (!m.isUnit(limitValue)) throw new Error(`rule limit without a unit for a '${unit}' check: ${rule}`);
      limit = limitValue.toNumber(unit); // throws if the dimensions do not match
    }
    bounds.push({ side: op.startsWith("<") ? "upper" : "lower", limit });
  });
  return bounds;
}

describe("starter knowledge base: shape and counts", () => {
  it("covers the whole car: at least 110 symptoms, 160 failure modes, 180 checks and 30 trouble codes", () => {
    expect(kb.symptoms.length).toBeGreaterThanOrEqual(110);
    expect(leaves.length).toBeGreaterThanOrEqual(160);
    expect(kb.checks.length).toBeGreaterThanOrEqual(180);
    expect(troubleCodeSymptoms.length).toBeGreaterThanOrEqual(30);
  });

  it("uses exactly the symptom kinds and the ten systems of the lists", () => {
    expect([...SYMPTOM_KINDS]).toEqual([
      "noise",
      "vibration",
      "pull",
      "warning_lamp",
      "trouble_code",
      "smell",
      "leak",
      "consumption",
      "electrical",
      "performance",
      "visible",
    ]);
    for (const sys of [
      "brakes",
      "suspension_steering",
      "wheels_tyres",
      "driveline",
      "engine_fuel_emissions",
      "engine_mechanical",
      "cooling",
      "electrical",
      "exhaust",
      "body",
    ]) {
      expect(SYSTEMS).toContain(sys);
    }
    expect(SYSTEMS).toHaveLength(10);
    for (const kind of SYMPTOM_KINDS)
      expect(
        kb.symptoms.some((s) => s.kind === kind),
        kind,
      ).toBe(true);
  });

  it("covers every system with a root, components, failure modes, symptoms and checks", () => {
    for (const system of SYSTEMS) {
      const roots = kb.causes.filter((c) => c.system === system && c.level === "system");
      expect(roots, system).toHaveLength(1);
      expect(
        kb.causes.filter((c) => c.system === system && c.level === "component").length,
        system,
      ).toBeGreaterThanOrEqual(2);
      const sysLeaves = leaves.filter((c) => c.system === system);
      expect(sysLeaves.length, system).toBeGreaterThanOrEqual(5);
      expect(kb.symptoms.filter((s) => s.system === system).length, system).toBeGreaterThanOrEqual(4);
      const sysChecks = new Set(sysLeaves.flatMap((l) => checksFor(l.key)));
      expect(sysChecks.size, system).toBeGreaterThanOrEqual(5);
    }
  });

  it("uses unique slug keys across symptoms, causes and checks", () => {
    const keys = [...kb.symptoms, ...kb.causes, ...kb.checks].map((x) => x.key);
    expect(new Set(keys).size).toBe(keys.length);
    for (const k of keys) expect(k).toMatch(/^[a-z][a-z0-9_]*$/);
  });

  it("never repeats a symptom, cause or check name", () => {
    for (const list of [kb.symptoms, kb.causes, kb.checks]) {
      const names = list.map((x) => x.name.trim().toLowerCase());
      const dupes = names.filter((n, i) => names.indexOf(n) !== i);
      expect(dupes).toEqual([]);
    }
  });

  it("keeps every part file small (under 350 lines)", () => {
    for (const f of readdirSync(KB_DIR).filter((f) => f.endsWith(".ts"))) {
      const lines = readFileSync(KB_DIR + f, "utf8").split("\n").length;
      expect(lines, f).toBeLessThan(350);
    }
  });
});

describe("cause tree", () => {
  it("links every parent, keeps system → component → failure_mode levels and the same system", () => {
    const childLevel = { system: "component", component: "failure_mode" } as const;
    for (const c of kb.causes) {
      if (c.level === "system") {
        expect(c.parentKey, c.key).toBeNull();
        expect(c.key).toBe(c.system);
        continue;
      }
      expect(c.parentKey, c.key).not.toBeNull();
      const parent = causeByKey.get(c.parentKey!);
      expect(parent, `${c.key} → ${c.parentKey}`).toBeDefined();
      expect(childLevel[parent!.level as "system" | "component"], c.key).toBe(c.level);
      expect(parent!.system, c.key).toBe(c.system);
    }
  });

  it("is acyclic: every node reaches a system root within two steps", () => {
    for (const c of kb.causes) {
      const seen = new Set<string>([c.key]);
      let cur: CauseSeed | undefined = c;
      let steps = 0;
      while (cur && cur.parentKey) {
        expect(seen.has(cur.parentKey), `cycle at ${c.key}`).toBe(false);
        seen.add(cur.parentKey);
        cur = causeByKey.get(cur.parentKey);
        steps++;
      }
      expect(cur?.level).toBe("system");
      expect(steps).toBeLessThanOrEqual(2);
    }
  });

  it("gives every component at least one failure mode", () => {
    for (const c of kb.causes.filter((x) => x.level === "component")) {
      expect(
        leaves.some((l) => l.parentKey === c.key),
        c.key,
      ).toBe(true);
    }
  });

  it("puts base rate, priority and repair figures on failure modes only, and on all of them", () => {
    for (const c of kb.causes) {
      const figures = [c.baseRate, c.priority, c.repairMinutes, c.partsCost];
      if (c.level === "failure_mode") {
        expect(
          figures.every((f) => f !== undefined),
          c.key,
        ).toBe(true);
        expect(c.baseRate!, c.key).toBeGreaterThan(0);
        expect(PRIORITIES).toContain(c.priority);
        expect(c.repairMinutes!, c.key).toBeGreaterThan(0);
        expect(c.partsCost!, c.key).toBeGreaterThanOrEqual(0);
      } else {
        expect(
          figures.every((f) => f === undefined),
          c.key,
        ).toBe(true);
        expect(c.applicability, c.key).toBeUndefined();
      }
      expect(c.description.length, c.key).toBeGreaterThan(20);
    }
  });

  it("uses only known applicability values", () => {
    for (const c of leaves) {
      const a = c.applicability;
      if (!a) continue;
      for (const f of a.fuel ?? []) expect(FUEL_TYPES).toContain(f);
      for (const d of a.drivetrain ?? []) expect(DRIVETRAINS).toContain(d);
      if (a.fuel) expect(a.fuel.length, c.key).toBeGreaterThan(0);
      if (a.minKm !== undefined) expect(a.minKm).toBeGreaterThan(0);
      if (a.minAgeYears !== undefined) expect(a.minAgeYears).toBeGreaterThan(0);
      if (a.youngFactor !== undefined) {
        expect(a.minKm, `${c.key}: youngFactor needs minKm`).toBeDefined();
        expect(a.youngFactor).toBeGreaterThan(0);
        expect(a.youngFactor).toBeLessThanOrEqual(1);
      }
    }
  });

  it("keeps exhaust and fuelling faults off electric cars, and diesel/petrol/drivetrain faults where they belong", () => {
    for (const c of leaves.filter((l) =>
      ["exhaust", "engine_fuel_emissions", "engine_mechanical"].includes(l.system),
    )) {
      expect(c.applicability?.fuel, c.key).toBeDefined();
      expect(c.applicability!.fuel, c.key).not.toContain("electric");
    }
    for (const k of ["glow_plugs_failed", "egr_valve_sticking", "dpf_blocked"]) {
      expect(causeByKey.get(k)!.applicability?.fuel).toEqual(["diesel"]);
    }
    for (const k of [
      "spark_plugs_worn",
      "ignition_coil_failed",
      "lambda_sensor_slow",
      "catalyst_inefficient",
    ]) {
      expect(causeByKey.get(k)!.applicability?.fuel).not.toContain("diesel");
    }
    for (const k of ["propshaft_uj_worn", "propshaft_centre_bearing"]) {
      expect(causeByKey.get(k)!.applicability?.drivetrain).not.toContain("fwd");
    }
    expect(causeByKey.get("cv_outer_worn")!.applicability?.drivetrain).not.toContain("rwd");
    expect(causeByKey.get("clutch_worn")!.applicability?.minKm).toBeGreaterThan(0);
    expect(causeByKey.get("damper_worn")!.applicability?.minKm).toBeGreaterThan(0);
  });

  it("marks the unsafe-to-drive faults Stop", () => {
    for (const k of [
      "brake_fluid_leak",
      "brake_pads_metal",
      "tyre_tread_worn",
      "tyre_sidewall_damage",
      "ball_joint_worn",
      "wheel_nuts_loose",
      "fuel_leak",
      "caliper_bolt_loose",
      "brake_pipe_corroded",
      "brake_servo_vacuum",
      "wheel_stud_damaged",
      "spring_seat_corroded",
      "thermostat_stuck_closed",
      "head_gasket_failed",
      "oil_pump_pickup_blocked",
      "engine_bearings_worn",
      "subframe_mount_corrosion",
      "sill_corrosion",
    ]) {
      expect(causeByKey.get(k)!.priority, k).toBe("stop");
    }
    // nothing broken: a switch left on is shown to the owner, not charged as a repair
    for (const k of ["window_lock_on", "child_lock_on"]) expect(causeByKey.get(k)!.priority, k).toBe("sound");
    expect(causeByKey.get("brake_pads_worn")!.baseRate!).toBeGreaterThan(
      causeByKey.get("brake_caliper_sticking")!.baseRate!,
    );
  });
});

describe("symptoms and checks", () => {
  it("uses known systems, kinds, access, cautions and skills", () => {
    for (const s of kb.symptoms) {
      expect(SYSTEMS).toContain(s.system);
      expect(SYMPTOM_KINDS).toContain(s.kind);
      expect(s.synonyms.length, s.key).toBeGreaterThanOrEqual(3);
      expect(s.conditions.length, s.key).toBeGreaterThanOrEqual(1);
    }
    for (const c of kb.checks) {
      for (const a of c.access) expect(ACCESS).toContain(a);
      for (const x of c.cautions) expect(CAUTIONS).toContain(x);
      expect(SKILLS).toContain(c.skill);
      expect(new Set(c.cautions).size, c.key).toBe(c.cautions.length);
      expect(c.instructions.length, c.key).toBeGreaterThanOrEqual(2);
      expect(c.minutes, c.key).toBeGreaterThan(0);
      expect(c.consumablesCost, c.key).toBeGreaterThanOrEqual(0);
      expect(c.result.failMeans.length, c.key).toBeGreaterThan(10);
    }
  });

  it("has one generic trouble-code symptom, without a code, for any code not listed by itself", () => {
    const generic = kb.symptoms.filter((s) => s.kind === "trouble_code" && s.code === undefined);
    expect(generic.map((s) => s.key)).toEqual(["trouble_code_stored"]);
    // chassis and body faults, whose own codes are not symptoms here, point to it
    const linked = linksOf("trouble_code_stored").map((l) => l.cause);
    for (const k of ["abs_wheel_sensor", "seat_airbag_connector", "eps_fault"]) expect(linked).toContain(k);
  });

  it("gives a code to trouble-code symptoms only, upper case, named and typed the way technicians type it", () => {
    for (const s of kb.symptoms) {
      if (s.key === "trouble_code_stored") continue;
      if (s.kind !== "trouble_code") {
        expect(s.code, s.key).toBeUndefined();
        continue;
      }
      expect(s.code, s.key).toBeDefined();
      expect(s.code, s.key).toBe(s.code!.toUpperCase());
      expect(s.name.startsWith(`${s.code} stored: `), s.name).toBe(true);
      expect(s.synonyms, s.key).toContain(s.code);
      expect(
        s.synonyms.map((x) => x.toLowerCase()),
        s.key,
      ).toContain(s.code!.toLowerCase());
    }
    const codes = troubleCodeSymptoms.map((s) => s.code);
    expect(new Set(codes).size).toBe(codes.length);
  });

  it("parses every trouble code with the SAE J2012 parser and keeps to generic codes", () => {
    for (const s of troubleCodeSymptoms) {
      const parsed = parseDtc(s.code!);
      expect(parsed.valid, s.code).toBe(true);
      if (!parsed.valid) continue;
      expect(parsed.code, s.key).toBe(s.code);
      expect(isGeneric(s.code!), s.code).toBe(true);
    }
    // the brief: at least 35 of the codes are of the plainest generic form, second character 0
    expect(
      troubleCodeSymptoms.filter((s) => parseDtc(s.code!).valid && s.code![1] === "0").length,
    ).toBeGreaterThanOrEqual(35);
    // the usual ones are all there
    for (const c of [
      "P0171",
      "P0172",
      "P0300",
      "P0301",
      "P0302",
      "P0303",
      "P0304",
      "P0420",
      "P0117",
      "P0118",
      "P0128",
      "P0101",
      "P0130",
      "P0135",
      "P0136",
      "P0141",
      "P0401",
      "P0441",
      "P0455",
      "P0505",
      "P0562",
      "P0563",
      "P0700",
      "P2002",
    ]) {
      expect(
        troubleCodeSymptoms.some((s) => s.code === c),
        c,
      ).toBe(true);
    }
  });

  it("mentions only generic codes anywhere in the data, and only codes that are symptoms too", () => {
    const mentioned = JSON.stringify(kb).match(/\b[PCBU][0-9][0-9A-F]{3}\b/g) ?? [];
    expect(mentioned.length).toBeGreaterThan(0);
    const asSymptoms = new Set(troubleCodeSymptoms.map((s) => s.code));
    for (const code of mentioned) {
      expect(isGeneric(code), code).toBe(true);
      expect(asSymptoms.has(code), `${code} is mentioned but is not a trouble-code symptom`).toBe(true);
    }
  });

  it("says beside every code title whether it is from SOURCES.md or from memory", () => {
    const lines = kbSources().flatMap((src) => src.split("\n"));
    for (const s of troubleCodeSymptoms) {
      const line = lines.find((l) => l.includes(`troubleCode("${s.code}"`));
      expect(line, s.code).toBeDefined();
      const comment = line!.slice(line!.indexOf("//"));
      expect(line!.includes("//"), s.code).toBe(true);
      if (CODES_IN_SOURCES.has(s.code!)) expect(comment, s.code).toMatch(/SOURCES\.md/);
      else expect(comment, s.code).toMatch(/from memory/);
    }
  });

  it("names the warning lamps, each as a warning_lamp with lamp or light among its words", () => {
    const lamps = [
      "check_engine_light",
      "oil_pressure_lamp",
      "charge_light",
      "airbag_lamp",
      "abs_light",
      "red_brake_lamp",
      "coolant_temp_lamp",
      "glow_plug_lamp",
      "dpf_light",
      "tyre_pressure_light",
      "pas_lamp",
      "esc_lamp",
    ];
    for (const k of lamps) {
      const s = symptomByKey.get(k);
      expect(s, k).toBeDefined();
      expect(s!.kind, k).toBe("warning_lamp");
      expect(/lamp/i.test(s!.name), k).toBe(true);
      expect(
        s!.synonyms.some((x) => /\blight\b/i.test(x)),
        `${k}: owners say "light"`,
      ).toBe(true);
    }
    expect(symptomByKey.get("check_engine_light")!.name).toMatch(
      /MIL|malfunction indicator|engine management/i,
    );
  });

  it("re-kinds fuel and oil use as consumption", () => {
    expect(symptomByKey.get("high_fuel_consumption")!.kind).toBe("consumption");
    expect(symptomByKey.get("oil_use")!.kind).toBe("consumption");
  });

  it("never gives two symptoms the same synonym, nor one symptom the same word twice", () => {
    const owner = new Map<string, string>();
    for (const s of kb.symptoms) {
      for (const w of s.synonyms) {
        const k = w.trim().toLowerCase();
        expect(owner.get(k), `"${w}" in ${s.key} and ${owner.get(k)}`).toBeUndefined();
        owner.set(k, s.key);
      }
    }
  });

  it("gives the demo journey words a home in the synonyms", () => {
    const has = (key: string, word: string) =>
      symptomByKey.get(key)!.synonyms.some((s) => s.toLowerCase().includes(word));
    expect(has("vibration_braking", "judder")).toBe(true);
    expect(has("vibration_braking", "shudder")).toBe(true);
    expect(has("vibration_braking", "shake")).toBe(true);
    expect(has("vibration_braking", "wobble")).toBe(true);
    expect(has("clunk_front_bumps", "clunk")).toBe(true);
    expect(has("clunk_front_bumps", "knock")).toBe(true);
    expect(has("high_fuel_consumption", "drinks fuel")).toBe(true);
    expect(has("high_fuel_consumption", "mpg dropped")).toBe(true);
    expect(has("pulls_driving", "pulls")).toBe(true);
    expect(has("pulls_driving", "drifts")).toBe(true);
    expect(has("squeal_braking", "squeak")).toBe(true);
    expect(has("no_crank", "won't start")).toBe(true);
    expect(has("no_crank", "no crank")).toBe(true);
    expect(has("rear_windows_dead", "back windows won't go down")).toBe(true);
  });
});

describe("safety cautions", () => {
  it("leaves no check without a caution its work calls for (the rule the editor and the import apply)", () => {
    const lacking = kb.checks.filter((c) => missingCautions(c).length > 0).map((c) => c.key);
    expect(lacking).toEqual([]);
  });

  it("puts 'lifting' on every check that uses the ramp or takes wheels off", () => {
    for (const c of kb.checks.filter((x) => x.access.includes("ramp") || x.access.includes("wheels_off"))) {
      expect(c.cautions, c.key).toContain("lifting");
    }
  });

  // Word rules: what the check makes the technician do (its name and steps) decides its cautions.
  // The word rules live in app/domain/hazards.ts, which the editor and the import use too.
  for (const [caution, words] of HAZARD_WORDS) {
    it(`puts '${caution}' on every check whose steps involve it (${words.source.slice(0, 40)}…)`, () => {
      const hits = kb.checks.filter((c) => words.test(doing(c)));
      expect(hits.length, caution).toBeGreaterThan(0);
      for (const c of hits) expect(c.cautions, `${c.key}: ${caution}`).toContain(caution);
    });
  }

  it("puts 'exhaust_fumes' on every check that runs the engine in the workshop", () => {
    const runsEngine =
      /engine (running|idling)|at (warm |hot )?idle|start the engine|run the engine|engine warm and idling|while cranking|crank or idle|idle the engine/i;
    for (const c of kb.checks.filter(
      (x) => runsEngine.test(x.instructions.join(" ")) && !x.access.includes("road_test"),
    )) {
      expect(c.cautions, c.key).toContain("exhaust_fumes");
    }
  });

  it("puts 'rotating_parts' on every check that works under the bonnet with the engine running", () => {
    const running =
      /engine (running|idling)|at (warm |hot )?idle|idle the engine|run the engine|while cranking/i;
    for (const c of kb.checks.filter(
      (x) => x.access.includes("bonnet_open") && running.test(x.instructions.join(" ")),
    )) {
      expect(c.cautions, c.key).toContain("rotating_parts");
    }
  });

  it("keeps apprentices to safe looking and listening: no fuel, airbag, bleeding or hybrid work; airbag parts to seniors", () => {
    for (const c of kb.checks.filter((x) => x.skill === "apprentice")) {
      expect(c.cautions, c.key).not.toContain("fuel");
      expect(c.cautions, c.key).not.toContain("airbag");
      expect(doing(c), c.key).not.toMatch(/bleed|hybrid/i);
    }
    const airbagParts = kb.checks.filter(
      (x) => x.cautions.includes("airbag") && /clock spring|seat/i.test(x.name),
    );
    expect(airbagParts.length).toBeGreaterThanOrEqual(2);
    for (const c of airbagParts) expect(c.skill, c.key).toBe("senior");
  });

  it("puts 'brake_hydraulics' on every check that bleeds or handles brake fluid", () => {
    for (const c of kb.checks.filter((x) => /bleed|brake fluid/i.test(text(x)))) {
      expect(c.cautions, c.key).toContain("brake_hydraulics");
    }
    expect(checkByKey.get("brake_bleed_judgement")!.cautions).toContain("brake_hydraulics");
  });

  it("puts 'exhaust_fumes' wherever extraction is called for, 'high_voltage' wherever high voltage is mentioned", () => {
    for (const c of kb.checks) {
      const words = c.instructions.join(" ");
      expect(/exhaust extraction|outdoors/i.test(words), c.key).toBe(c.cautions.includes("exhaust_fumes"));
      if (/high.voltage|orange cable/i.test(words)) expect(c.cautions, c.key).toContain("high_voltage");
    }
  });

  it("never opens a hot cooling system without the 'pressurised_cooling' caution", () => {
    const opensCooling = (words: string) =>
      /coolant|cooling/i.test(words) && /\bcap\b|filler|tank/i.test(words);
    for (const c of kb.checks.filter((x) => opensCooling(x.instructions.join(" ")))) {
      expect(c.cautions, c.key).toContain("pressurised_cooling");
    }
  });

  it("tells the technician to follow the maker's procedure whenever a check carries a caution", () => {
    for (const c of kb.checks.filter((x) => x.cautions.length > 0)) {
      expect(c.instructions.join(" "), c.key).toMatch(/maker's procedure/i);
    }
  });

  it("keeps scan-tool work above apprentice level", () => {
    for (const c of kb.checks.filter((x) => x.access.includes("scan_tool")))
      expect(c.skill, c.key).not.toBe("apprentice");
  });
});

describe("links", () => {
  it("joins existing endpoints, symptom links only to failure modes, and no pair twice", () => {
    for (const l of kb.symptomLinks) {
      expect(symptomByKey.has(l.symptom), l.symptom).toBe(true);
      expect(causeByKey.get(l.cause)?.level, l.cause).toBe("failure_mode");
    }
    for (const l of kb.checkLinks) {
      expect(checkByKey.has(l.check), l.check).toBe(true);
      expect(causeByKey.has(l.cause), l.cause).toBe(true);
    }
    const sPairs = kb.symptomLinks.map((l) => `${l.symptom}|${l.cause}`);
    const cPairs = kb.checkLinks.map((l) => `${l.check}|${l.cause}`);
    expect(new Set(sPairs).size).toBe(sPairs.length);
    expect(new Set(cPairs).size).toBe(cPairs.length);
  });

  it("never links one check to both a node and something below it", () => {
    for (const check of kb.checks) {
      const targets = new Set(kb.checkLinks.filter((l) => l.check === check.key).map((l) => l.cause));
      for (const t of targets) {
        for (const a of ancestors(t)) expect(targets.has(a), `${check.key}: ${t} under ${a}`).toBe(false);
      }
    }
  });

  it("makes every failure mode reachable from a symptom and tested by a check (directly or through an ancestor)", () => {
    for (const leaf of leaves) {
      expect(kb.symptomLinks.filter((l) => l.cause === leaf.key).length, leaf.key).toBeGreaterThanOrEqual(1);
      expect(checksFor(leaf.key).length, leaf.key).toBeGreaterThanOrEqual(1);
    }
    // A fault with a single symptom (a broken door handle) is told apart by its checks; most have more.
    const several = leaves.filter((l) => kb.symptomLinks.filter((x) => x.cause === l.key).length >= 2);
    expect(several.length / leaves.length).toBeGreaterThanOrEqual(0.9);
  });

  it("links every trouble code to the failure modes that set it, more than one where several do", () => {
    for (const s of troubleCodeSymptoms) {
      const causes = linksOf(s.key).map((l) => causeByKey.get(l.cause)!);
      expect(causes.length, s.code).toBeGreaterThanOrEqual(1);
      for (const c of causes)
        expect(c.applicability?.fuel ?? ["petrol"], `${s.code} → ${c.key}`).not.toEqual(["electric"]);
    }
    const cause = (code: string) => linksOf(`dtc_${code.toLowerCase()}`).map((l) => l.cause);
    expect(cause("P0420")).toContain("catalyst_inefficient");
    expect(cause("P0171")).toEqual(
      expect.arrayContaining(["intake_air_leak", "maf_sensor_fault", "fuel_pump_weak"]),
    );
    expect(cause("P0128")).toContain("thermostat_stuck_open");
    expect(cause("P0301")).toEqual(expect.arrayContaining(["ignition_coil_failed", "spark_plugs_worn"]));
    expect(cause("P0562")).toContain("alternator_not_charging");
  });

  it("links every symptom to a cause and every check to a cause", () => {
    for (const s of kb.symptoms) expect(linksOf(s.key).length, s.key).toBeGreaterThanOrEqual(1);
    for (const c of kb.checks)
      expect(
        kb.checkLinks.some((l) => l.check === c.key),
        c.key,
      ).toBe(true);
  });

  it("has some checks that bear on a whole component or system", () => {
    const nodeLinks = kb.checkLinks.filter((l) => causeByKey.get(l.cause)!.level !== "failure_mode");
    expect(nodeLinks.length).toBeGreaterThanOrEqual(5);
    expect(nodeLinks.some((l) => l.check === "brake_road_test" && l.cause === "brakes")).toBe(true);
    expect(
      nodeLinks.some((l) => l.check === "engine_fault_memory" && l.cause === "engine_fuel_emissions"),
    ).toBe(true);
  });

  it("keeps every probability in range", () => {
    for (const s of kb.symptoms) {
      expect(s.leak, s.key).toBeGreaterThanOrEqual(0);
      expect(s.leak, s.key).toBeLessThanOrEqual(1);
      expect(s.leak, `${s.key}: leak should be small`).toBeLessThanOrEqual(0.1);
    }
    for (const l of kb.symptomLinks) {
      expect(l.p, `${l.symptom}|${l.cause}`).toBeGreaterThan(0);
      expect(l.p, `${l.symptom}|${l.cause}`).toBeLessThanOrEqual(1);
    }
    for (const l of kb.checkLinks) {
      expect(l.pFail, `${l.check}|${l.cause}`).toBeGreaterThan(0);
      expect(l.pFail, `${l.check}|${l.cause}`).toBeLessThanOrEqual(1);
    }
    for (const c of kb.checks) {
      expect(c.falseAlarm, c.key).toBeGreaterThanOrEqual(0);
      expect(c.falseAlarm, c.key).toBeLessThanOrEqual(0.2);
    }
  });

  it("makes a check's hit rate on its causes beat its false-alarm rate", () => {
    for (const l of kb.checkLinks)
      expect(l.pFail, `${l.check}|${l.cause}`).toBeGreaterThan(checkByKey.get(l.check)!.falseAlarm);
  });
});

describe("owner words on failure modes", () => {
  it("gives every failure mode an owner description and what happens if it is left, in its own words", () => {
    for (const c of leaves) {
      for (const field of ["ownerDescription", "ifLeft"] as const) {
        const said = c[field];
        expect(said, `${c.key}.${field}`).toBeDefined();
        expect(said!.trim().length, `${c.key}.${field}`).toBeGreaterThan(25);
        expect(said!.toLowerCase(), `${c.key}.${field} repeats the technical name`).not.toContain(
          c.name.toLowerCase(),
        );
        expect(said, `${c.key}.${field} names a trouble code`).not.toMatch(/\b[PCBU][0-9][0-9A-F]{3}\b/);
        expect(said, `${c.key}.${field} uses a key`).not.toContain(c.key);
        expect(said!.trim(), `${c.key}.${field}`).toMatch(/[.!]$/);
      }
      expect(c.ownerDescription, c.key).not.toBe(c.ifLeft);
      expect(c.ownerDescription, c.key).not.toBe(c.description);
    }
    const texts = leaves.map((c) => c.ownerDescription);
    expect(new Set(texts).size).toBe(texts.length);
  });

  it("keeps owner words off the tree's system and component nodes", () => {
    for (const c of kb.causes.filter((x) => x.level !== "failure_mode")) {
      expect(c.ownerDescription, c.key).toBeUndefined();
      expect(c.ifLeft, c.key).toBeUndefined();
    }
  });

  it("tells the owner plainly when the car must not be driven", () => {
    for (const c of leaves.filter((x) => x.priority === "stop")) {
      expect(c.ifLeft, c.key).toMatch(/not be driven|not drive|must not|should not|do not/i);
    }
  });
});

describe("measurement rules", () => {
  it("has a healthy number of measurement checks", () => {
    expect(measurementChecks.length).toBeGreaterThanOrEqual(15);
  });

  for (const c of measurementChecks) {
    if (c.result.kind !== "measurement") continue;
    const { rule, unit } = c.result;
    describe(c.key, () => {
      it("parses, names only `value` and known units, and converts its limits to the check's unit", () => {
        const node = m.parse(rule);
        const symbols = node
          .filter((n: MathNode) => m.isSymbolNode(n))
          .map((n) => (n as unknown as { name: string }).name);
        expect(symbols).toContain("value");
        for (const s of symbols.filter((s) => s !== "value"))
          expect(m.Unit.isValuelessUnit(s), `${s} in ${rule}`).toBe(true);
        if (unit !== "") expect(() => m.unit(1, unit)).not.toThrow();
        expect(boundsOf(rule, unit).length).toBeGreaterThanOrEqual(1);
      });

      it("evaluates to a boolean; passes inside the limits and fails far beyond them", () => {
        expect(typeof evaluate(rule, sample(1, unit))).toBe("boolean");
        const bounds = boundsOf(rule, unit);
        const lowers = bounds.filter((b) => b.side === "lower").map((b) => b.limit);
        const uppers = bounds.filter((b) => b.side === "upper").map((b) => b.limit);
        const lo = lowers.length ? Math.max(...lowers) : undefined;
        const hi = uppers.length ? Math.min(...uppers) : undefined;
        const inside = lo !== undefined && hi !== undefined ? (lo + hi) / 2 : (lo ?? hi)!;
        expect(evaluate(rule, sample(inside, unit)), `${rule} at ${inside}`).toBe(true);
        for (const u of uppers) {
          const far = u > 0 ? u * 10 : u + 10 * (Math.abs(u) + 1);
          expect(evaluate(rule, sample(far, unit)), `${rule} at ${far}`).toBe(false);
        }
        for (const l of lowers) {
          const far = l > 0 ? l / 10 : l - 10 * (Math.abs(l) + 1);
          expect(evaluate(rule, sample(far, unit)), `${rule} at ${far}`).toBe(false);
        }
      });
    });
  }

  it("cites a source beside every rule, and sends maker-specific limits to the maker's figure", () => {
    const files = readdirSync(KB_DIR).filter((f) => f.endsWith(".ts") && f !== "types.ts");
    const sources = files.map((f) => readFileSync(KB_DIR + f, "utf8"));
    for (const c of measurementChecks) {
      const src = sources.find((s) => s.includes(`key: "${c.key}"`));
      expect(src, c.key).toBeDefined();
      const lines = src!.split("\n");
      const keyLine = lines.findIndex((l) => l.includes(`key: "${c.key}"`));
      const ruleLine = lines.findIndex((l, i) => i > keyLine && l.includes("rule: "));
      const comment = [lines[ruleLine]];
      for (let j = ruleLine - 1; j > keyLine && lines[j].trim().startsWith("//"); j--) comment.push(lines[j]);
      const said = comment.filter((l) => l.includes("//")).join(" ");
      expect(said, `${c.key}: no source comment beside its rule`).toMatch(
        /published|secondary|common practice|from memory|derived/i,
      );
      if (/maker-specific/i.test(said)) expect(text(c), c.key).toMatch(/maker's [a-z -]*(figure|table)/i);
    }
  });

  it("lists every measurement rule with its source in docs/knowledge-base.md", () => {
    const doc = readFileSync(DOC, "utf8");
    for (const c of measurementChecks) {
      if (c.result.kind !== "measurement") continue;
      const row = doc.split("\n").find((l) => l.startsWith("|") && l.includes(`\`${c.key}\``));
      expect(row, `${c.key} missing from the limits table`).toBeDefined();
      expect(row!, c.key).toContain(`\`${c.result.rule}\``);
    }
  });
});

describe("demo journeys", () => {
  const topBy = (symptom: string) =>
    linksOf(symptom)
      .map((l) => ({ cause: l.cause, score: l.p * causeByKey.get(l.cause)!.baseRate! }))
      .sort((a, b) => b.score - a.score);

  it("vibration under braking: disc run-out / thickness variation leads, with the right competitors", () => {
    const ranked = topBy("vibration_braking");
    expect(ranked[0].cause).toBe("brake_disc_runout_dtv");
    const linked = ranked.map((r) => r.cause);
    for (const k of ["brake_pad_deposits", "arm_bush_worn", "wheel_bearing_worn", "wheel_out_of_balance"])
      expect(linked).toContain(k);
    // out-of-balance is weaker under braking than at steady speed
    const p = (s: string, c: string) => kb.symptomLinks.find((l) => l.symptom === s && l.cause === c)!.p;
    expect(p("vibration_braking", "wheel_out_of_balance")).toBeLessThan(
      p("vibration_speed", "wheel_out_of_balance"),
    );
  });

  it("vibration under braking: the check plan has the gauge, micrometer, visual, road test, balance and play checks", () => {
    const onDisc = checksFor("brake_disc_runout_dtv");
    for (const k of [
      "disc_runout_dial_gauge",
      "disc_thickness_variation",
      "disc_surface_visual",
      "brake_road_test",
    ])
      expect(onDisc).toContain(k);
    expect(checksFor("wheel_out_of_balance")).toContain("wheel_balance");
    expect(checksFor("arm_bush_worn")).toContain("suspension_play_ramp");
    const gauge = checkByKey.get("disc_runout_dial_gauge")!;
    expect(gauge.result).toMatchObject({
      kind: "measurement",
      quantity: "length",
      unit: "mm",
      rule: "value <= 0.05 mm",
    });
    const rule = (gauge.result as { rule: string }).rule;
    expect(evaluate(rule, m.unit(0.09, "mm"))).toBe(false);
    expect(evaluate(rule, m.unit(0.0035, "inch"))).toBe(false); // 0.089 mm
    expect(evaluate(rule, m.unit(0.03, "mm"))).toBe(true);
    expect(evaluate(rule, m.unit(0.001, "inch"))).toBe(true); // 0.0254 mm
  });

  it("clunk over bumps: the front-end suspects are all linked, drop link first", () => {
    const ranked = topBy("clunk_front_bumps");
    expect(ranked[0].cause).toBe("drop_link_worn");
    for (const k of ["arb_bush_worn", "top_mount_worn", "ball_joint_worn", "damper_worn"])
      expect(ranked.map((r) => r.cause)).toContain(k);
  });

  it("pulls to one side: alignment, tyre pressure, tyre conicity and a sticking caliper", () => {
    const ranked = topBy("pulls_driving");
    expect(ranked[0].cause).toBe("alignment_out");
    for (const k of ["tyre_pressure_low", "tyre_internal_fault", "brake_caliper_sticking"])
      expect(ranked.map((r) => r.cause)).toContain(k);
  });

  it("drinks fuel: tyres, dragging brake, thermostat, lambda and air leak, with a two-sided fuel-trim rule", () => {
    const linked = linksOf("high_fuel_consumption").map((l) => l.cause);
    for (const k of [
      "tyre_pressure_low",
      "brake_caliper_sticking",
      "thermostat_stuck_open",
      "lambda_sensor_slow",
      "intake_air_leak",
    ])
      expect(linked).toContain(k);
    const trim = checkByKey.get("long_term_fuel_trim")!.result as { rule: string; unit: string };
    expect(trim.unit).toBe("");
    expect(evaluate(trim.rule, 4)).toBe(true);
    expect(evaluate(trim.rule, 14)).toBe(false);
    expect(evaluate(trim.rule, -14)).toBe(false);
  });

  it("rear windows won't go down: lock-out switch, fuse, master switch, motor/regulator and door loom", () => {
    const linked = linksOf("rear_windows_dead").map((l) => l.cause);
    for (const k of [
      "window_lock_on",
      "window_fuse_blown",
      "window_master_switch",
      "window_regulator_motor",
      "door_loom_broken",
    ])
      expect(linked).toContain(k);
    const lock = checkByKey.get("window_lock_switch")!;
    expect(lock.minutes).toBeLessThanOrEqual(Math.min(...kb.checks.map((c) => c.minutes)));
    expect(causeByKey.get("window_lock_on")!.priority).toBe("sound");
  });

  it("P0420 stored: the catalyst leads, a broken-up catalyst, the rear sensor and a leak compete, and the checks tell them apart", () => {
    const ranked = topBy("dtc_p0420");
    expect(ranked[0].cause).toBe("catalyst_inefficient");
    for (const k of ["catalyst_broken_up", "downstream_o2_fault", "exhaust_joint_leak"])
      expect(ranked.map((r) => r.cause)).toContain(k);
    expect(checksFor("catalyst_inefficient")).toContain("catalyst_sensor_compare");
    for (const k of ["exhaust_back_pressure", "box_rattle_tap"])
      expect(checksFor("catalyst_broken_up")).toContain(k);
    expect(checksFor("downstream_o2_fault")).toContain("downstream_o2_check");
  });

  it("rear door won't open from inside: the child lock is checked first and nothing is broken", () => {
    const linked = linksOf("door_wont_open_inside").map((l) => l.cause);
    for (const k of ["child_lock_on", "inner_door_handle_cable", "door_latch_seized"])
      expect(linked).toContain(k);
    const check = checkByKey.get("child_lock_check")!;
    expect(check.minutes).toBeLessThanOrEqual(Math.min(...kb.checks.map((c) => c.minutes)));
    expect(check.skill).toBe("apprentice");
    expect(checksFor("child_lock_on")).toContain("child_lock_check");
  });

  it("engine lamp and a lean code: the fuel-trim read bears on every cause of P0171", () => {
    const lean = linksOf("dtc_p0171").map((l) => l.cause);
    const trim = new Set(kb.checkLinks.filter((l) => l.check === "long_term_fuel_trim").map((l) => l.cause));
    for (const k of lean.filter((k) => !["brake_servo_vacuum", "manifold_leak"].includes(k)))
      expect(trim.has(k), k).toBe(true);
  });

  it("published and common-practice limits are where the docs say", () => {
    const rule = (k: string) => (checkByKey.get(k)!.result as { rule: string }).rule;
    expect(rule("tread_depth")).toBe("value >= 1.6 mm");
    expect(rule("battery_rest_voltage")).toBe("value >= 12.4 V");
    expect(rule("charging_voltage")).toBe("value >= 13.8 V and value <= 14.8 V");
    expect(rule("roller_brake_imbalance")).toBe("value >= 70");
    expect(evaluate(rule("tread_depth"), m.unit(1.5, "mm"))).toBe(false);
    expect(evaluate(rule("tyre_pressure_shortfall"), m.unit(2, "psi"))).toBe(true); // 13.8 kPa
    expect(evaluate(rule("tyre_pressure_shortfall"), m.unit(0.3, "bar"))).toBe(false);
    expect(evaluate(rule("ect_resistance"), m.unit(2500, "ohm"))).toBe(true);
    expect(evaluate(rule("ect_resistance"), m.unit(300, "ohm"))).toBe(false); // a hot-engine reading on a cold test
    expect(evaluate(rule("warm_up_temperature"), m.unit(70, "degC"))).toBe(false);
    expect(evaluate(rule("warm_up_temperature"), m.unit(190, "degF"))).toBe(true); // ≈ 87.8 °C
    expect(evaluate(rule("charging_voltage"), m.unit(15.2, "V"))).toBe(false);
  });
});
