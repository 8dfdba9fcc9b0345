// The rules a knowledge-base document must keep across its items, beyond each item's own shape
// (which KnowledgeDocumentSchema checks): keys unique and known, names not given twice, a tree of
// systems → components → failure modes without loops, rules that compile, trouble codes that
// parse, and every hazardous check with its caution. Each problem names the item and the reason,
// so an import can say exactly what to fix. Browser-safe and pure.
import { compileRule } from "~/measure";
import { parseDtc } from "~/measure/dtc";
import { missingCautions } from "./hazards";
import { CAUTION_LABEL } from "./knowledge";
import type { KnowledgeItems } from "./knowledge-document";

export type Problem = { where: string; message: string };

const PARENT_LEVEL = { system: null, component: "system", failure_mode: "component" } as const;

export function documentProblems(doc: KnowledgeItems): Problem[] {
  const problems: Problem[] = [];
  const say = (where: string, message: string) => problems.push({ where, message });

  const keysOf = <T extends { key: string; name: string }>(
    list: T[],
    kind: string,
    nameScope: (item: T) => string = () => "",
  ) => {
    const keys = new Map<string, T>();
    const names = new Map<string, string>();
    list.forEach((item, i) => {
      const where = `${kind}s.${i} (${item.key})`;
      if (keys.has(item.key)) say(where, `the key “${item.key}” is used by two ${kind}s`);
      else keys.set(item.key, item);
      const name = `${nameScope(item)}|${item.name.trim().toLowerCase()}`;
      const first = names.get(name);
      if (first) say(where, `the name “${item.name}” is already the name of ${kind} ${first}`);
      else names.set(name, item.key);
    });
    return keys;
  };
  const symptoms = keysOf(doc.symptoms, "symptom");
  // Two failure modes may share a name under different components ("Worn" pads and "Worn" discs).
  const causes = keysOf(doc.causes, "cause", (c) => c.parentKey ?? "");
  const checks = keysOf(doc.checks, "check");

  doc.causes.forEach((c, i) => {
    const where = `causes.${i} (${c.key})`;
    const wanted = PARENT_LEVEL[c.level];
    if (c.parentKey === null) {
      if (wanted !== null) say(where, `a ${c.level.replace("_", " ")} needs a parent (a ${wanted})`);
      return;
    }
    const parent = causes.get(c.parentKey);
    if (!parent) return say(where, `its parent “${c.parentKey}” is not a cause in this document`);
    if (loops(c.key, causes))
      return say(where, `the cause tree loops back to “${c.key}” through its parents`);
    if (wanted === null) say(where, "a system sits at the top of the tree and has no parent");
    else if (parent.level !== wanted)
      say(
        where,
        `the parent of a ${c.level.replace("_", " ")} is a ${wanted}, and “${parent.key}” is a ${parent.level.replace("_", " ")}`,
      );
  });

  doc.symptoms.forEach((s, i) => {
    if (s.kind !== "trouble_code" || !s.code) return;
    const parsed = parseDtc(s.code);
    if (!parsed.valid) say(`symptoms.${i} (${s.key})`, `its code ${s.code}: ${parsed.message}`);
  });

  doc.checks.forEach((c, i) => {
    const where = `checks.${i} (${c.key})`;
    const missing = missingCautions(c);
    if (missing.length)
      say(
        where,
        `its work calls for a caution it does not carry: ${missing.map((m) => CAUTION_LABEL[m]).join(", ")}`,
      );
    if (c.result.kind === "measurement") {
      try {
        compileRule(c.result.rule);
      } catch (e) {
        say(where, (e as Error).message);
      }
    }
  });

  const pairs = new Set<string>();
  doc.symptomLinks.forEach((l, i) => {
    const where = `symptomLinks.${i} (${l.symptom} → ${l.cause})`;
    if (!symptoms.has(l.symptom)) say(where, `no symptom has the key “${l.symptom}”`);
    const cause = causes.get(l.cause);
    if (!cause) say(where, `no cause has the key “${l.cause}”`);
    else if (cause.level !== "failure_mode")
      say(where, "a symptom links to a failure mode, not to a tree node");
    const pair = `s|${l.symptom}|${l.cause}`;
    if (pairs.has(pair)) say(where, "this symptom and cause are linked twice");
    pairs.add(pair);
  });
  doc.checkLinks.forEach((l, i) => {
    const where = `checkLinks.${i} (${l.check} → ${l.cause})`;
    if (!checks.has(l.check)) say(where, `no check has the key “${l.check}”`);
    if (!causes.has(l.cause)) say(where, `no cause has the key “${l.cause}”`);
    const pair = `c|${l.check}|${l.cause}`;
    if (pairs.has(pair)) say(where, "this check and cause are linked twice");
    pairs.add(pair);
  });
  return problems;
}

/** True when walking up from `key` through parents comes back to it. */
function loops(key: string, causes: Map<string, { parentKey: string | null }>): boolean {
  const seen = new Set<string>();
  let at: string | null = key;
  while (at !== null) {
    if (seen.has(at)) return at === key || seen.has(key);
    seen.add(at);
    at = causes.get(at)?.parentKey ?? null;
  }
  return false;
}
