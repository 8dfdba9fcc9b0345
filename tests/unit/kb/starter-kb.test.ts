// Integrity of the starter knowledge base: shape, tree, links, probabilities, measurement rules,
// safety cautions, limit sources, and the demo journeys the product is shown with.
import { readdirSync, readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { all, create, type MathNode } from "mathjs";
import { describe, expect, it } from "vitest";
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
  it("has at least 36 symptoms, 48 failure modes and 55 checks", () => {
    expect(kb.symptoms.length).toBeGreaterThanOrEqual(36);
    expect(leaves.length).toBeGreaterThanOrEqual(48);
    expect(kb.checks.length).toBeGreaterThanOrEqual(55);
  });

  it("covers every system with a root, components, failure modes, symptoms and checks", () => {
    for (const system of SYSTEMS) {
      const roots = kb.causes.filter((c) => c.system === system && c.level === "system");
      expect(roots, system).toHaveLength(1);
      expect(kb.causes.filter((c) => c.system === system && c.level === "component").length, system).toBeGreaterThanOrEqual(2);
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

  it("keeps every part file small (under 300 lines)", () => {
    for (const f of readdirSync(KB_DIR).filter((f) => f.endsWith(".ts"))) {
      const lines = readFileSync(KB_DIR + f, "utf8").split("\n").length;
      expect(lines, f).toBeLessThan(300);
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
      expect(leaves.some((l) => l.parentKey === c.key), c.key).toBe(true);
    }
  });

  it("puts base rate, priority and repair figures on failure modes only, and on all of them", () => {
    for (const c of kb.causes) {
      const figures = [c.baseRate, c.priority, c.repairMinutes, c.partsCost];
      if (c.level === "failure_mode") {
        expect(figures.every((f) => f !== undefined), c.key).toBe(true);
        expect(c.baseRate!, c.key).toBeGreaterThan(0);
        expect(PRIORITIES).toContain(c.priority);
        expect(c.repairMinutes!, c.key).toBeGreaterThan(0);
        expect(c.partsCost!, c.key).toBeGreaterThanOrEqual(0);
      } else {
        expect(figures.every((f) => f === undefined), c.key).toBe(true);
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
    for (const c of leaves.filter((l) => l.system === "exhaust" || l.system === "engine_fuel_emissions")) {
      expect(c.applicability?.fuel, c.key).toBeDefined();
      expect(c.applicability!.fuel, c.key).not.toContain("electric");
    }
    for (const k of ["glow_plugs_failed", "egr_valve_sticking", "dpf_blocked"]) {
      expect(causeByKey.get(k)!.applicability?.fuel).toEqual(["diesel"]);
    }
    for (const k of ["spark_plugs_worn", "ignition_coil_failed", "lambda_sensor_slow", "catalyst_inefficient"]) {
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
    for (const k of ["brake_fluid_leak", "brake_pads_metal", "tyre_tread_worn", "tyre_sidewall_damage", "ball_joint_worn", "wheel_nuts_loose", "fuel_leak"]) {
      expect(causeByKey.get(k)!.priority, k).toBe("stop");
    }
    expect(causeByKey.get("brake_pads_worn")!.baseRate!).toBeGreaterThan(causeByKey.get("brake_caliper_sticking")!.baseRate!);
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

  it("cites only the generic SAE J2012 codes listed in SOURCES.md", () => {
    const allowed = new Set(["P0171", "P0172", "P0300", "P0301", "P0420", "P0117", "P0118"]);
    const codes = JSON.stringify(kb).match(/\b[PCBU][0-9][0-9A-F]{3}\b/g) ?? [];
    expect(codes.length).toBeGreaterThan(0);
    for (const code of codes) expect(allowed.has(code), code).toBe(true);
  });
});

describe("safety cautions", () => {
  it("puts 'lifting' on every check that uses the ramp or takes wheels off", () => {
    for (const c of kb.checks.filter((x) => x.access.includes("ramp") || x.access.includes("wheels_off"))) {
      expect(c.cautions, c.key).toContain("lifting");
    }
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
    const opensCooling = (words: string) => /coolant|cooling/i.test(words) && /\bcap\b|filler|tank/i.test(words);
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
    for (const c of kb.checks.filter((x) => x.access.includes("scan_tool"))) expect(c.skill, c.key).not.toBe("apprentice");
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

  it("gives every failure mode at least two symptoms and one check (directly or through an ancestor)", () => {
    for (const leaf of leaves) {
      expect(kb.symptomLinks.filter((l) => l.cause === leaf.key).length, leaf.key).toBeGreaterThanOrEqual(2);
      expect(checksFor(leaf.key).length, leaf.key).toBeGreaterThanOrEqual(1);
    }
  });

  it("links every symptom to a cause and every check to a cause", () => {
    for (const s of kb.symptoms) expect(linksOf(s.key).length, s.key).toBeGreaterThanOrEqual(1);
    for (const c of kb.checks) expect(kb.checkLinks.some((l) => l.check === c.key), c.key).toBe(true);
  });

  it("has some checks that bear on a whole component or system", () => {
    const nodeLinks = kb.checkLinks.filter((l) => causeByKey.get(l.cause)!.level !== "failure_mode");
    expect(nodeLinks.length).toBeGreaterThanOrEqual(5);
    expect(nodeLinks.some((l) => l.check === "brake_road_test" && l.cause === "brakes")).toBe(true);
    expect(nodeLinks.some((l) => l.check === "engine_fault_memory" && l.cause === "engine_fuel_emissions")).toBe(true);
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
    for (const l of kb.checkLinks) expect(l.pFail, `${l.check}|${l.cause}`).toBeGreaterThan(checkByKey.get(l.check)!.falseAlarm);
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
        const symbols = node.filter((n: MathNode) => m.isSymbolNode(n)).map((n) => (n as unknown as { name: string }).name);
        expect(symbols).toContain("value");
        for (const s of symbols.filter((s) => s !== "value")) expect(m.Unit.isValuelessUnit(s), `${s} in ${rule}`).toBe(true);
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
      expect(said, `${c.key}: no source comment beside its rule`).toMatch(/published|secondary|common practice|from memory|derived/i);
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
    for (const k of ["brake_pad_deposits", "arm_bush_worn", "wheel_bearing_worn", "wheel_out_of_balance"]) expect(linked).toContain(k);
    // out-of-balance is weaker under braking than at steady speed
    const p = (s: string, c: string) => kb.symptomLinks.find((l) => l.symptom === s && l.cause === c)!.p;
    expect(p("vibration_braking", "wheel_out_of_balance")).toBeLessThan(p("vibration_speed", "wheel_out_of_balance"));
  });

  it("vibration under braking: the check plan has the gauge, micrometer, visual, road test, balance and play checks", () => {
    const onDisc = checksFor("brake_disc_runout_dtv");
    for (const k of ["disc_runout_dial_gauge", "disc_thickness_variation", "disc_surface_visual", "brake_road_test"]) expect(onDisc).toContain(k);
    expect(checksFor("wheel_out_of_balance")).toContain("wheel_balance");
    expect(checksFor("arm_bush_worn")).toContain("suspension_play_ramp");
    const gauge = checkByKey.get("disc_runout_dial_gauge")!;
    expect(gauge.result).toMatchObject({ kind: "measurement", quantity: "length", unit: "mm", rule: "value <= 0.05 mm" });
    const rule = (gauge.result as { rule: string }).rule;
    expect(evaluate(rule, m.unit(0.09, "mm"))).toBe(false);
    expect(evaluate(rule, m.unit(0.0035, "inch"))).toBe(false); // 0.089 mm
    expect(evaluate(rule, m.unit(0.03, "mm"))).toBe(true);
    expect(evaluate(rule, m.unit(0.001, "inch"))).toBe(true); // 0.0254 mm
  });

  it("clunk over bumps: the front-end suspects are all linked, drop link first", () => {
    const ranked = topBy("clunk_front_bumps");
    expect(ranked[0].cause).toBe("drop_link_worn");
    for (const k of ["arb_bush_worn", "top_mount_worn", "ball_joint_worn", "damper_worn"]) expect(ranked.map((r) => r.cause)).toContain(k);
  });

  it("pulls to one side: alignment, tyre pressure, tyre conicity and a sticking caliper", () => {
    const ranked = topBy("pulls_driving");
    expect(ranked[0].cause).toBe("alignment_out");
    for (const k of ["tyre_pressure_low", "tyre_internal_fault", "brake_caliper_sticking"]) expect(ranked.map((r) => r.cause)).toContain(k);
  });

  it("drinks fuel: tyres, dragging brake, thermostat, lambda and air leak, with a two-sided fuel-trim rule", () => {
    const linked = linksOf("high_fuel_consumption").map((l) => l.cause);
    for (const k of ["tyre_pressure_low", "brake_caliper_sticking", "thermostat_stuck_open", "lambda_sensor_slow", "intake_air_leak"]) expect(linked).toContain(k);
    const trim = checkByKey.get("long_term_fuel_trim")!.result as { rule: string; unit: string };
    expect(trim.unit).toBe("");
    expect(evaluate(trim.rule, 4)).toBe(true);
    expect(evaluate(trim.rule, 14)).toBe(false);
    expect(evaluate(trim.rule, -14)).toBe(false);
  });

  it("rear windows won't go down: lock-out switch, fuse, master switch, motor/regulator and door loom", () => {
    const linked = linksOf("rear_windows_dead").map((l) => l.cause);
    for (const k of ["window_lock_on", "window_fuse_blown", "window_master_switch", "window_regulator_motor", "door_loom_broken"]) expect(linked).toContain(k);
    const lock = checkByKey.get("window_lock_switch")!;
    expect(lock.minutes).toBeLessThanOrEqual(Math.min(...kb.checks.map((c) => c.minutes)));
    expect(causeByKey.get("window_lock_on")!.priority).toBe("sound");
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
