// Random models shaped like a workshop knowledge base: a three-level cause tree (system →
// component → failure mode), symptom links mostly to leaves and some to components, checks that
// bear on one to four causes, and a mix of owner and technician evidence.
import type { Evidence, Model } from "~/reasoning";
import { between, mulberry32, pick } from "./prng";

export type Size = { causes: number; links: number; checks: number; evidence: number };

export function generateCase(size: Size, seed: number): { model: Model; evidence: Evidence } {
  const rand = mulberry32(seed);
  const systems = Math.max(1, Math.round(size.causes * 0.01));
  const components = Math.max(1, Math.round(size.causes * 0.15));
  const causes: Model["causes"] = [];
  for (let i = 0; i < size.causes; i++) {
    const parentId =
      i < systems
        ? null
        : i < systems + components
          ? `c${Math.floor(rand() * systems)}`
          : `c${systems + Math.floor(rand() * components)}`;
    causes.push({ id: `c${i}`, parentId, prior: between(rand, 0.1, 10) });
  }
  const componentIds = causes.slice(systems, systems + components).map((c) => c.id);
  const leafIds = causes.slice(systems + components).map((c) => c.id);
  const causeFor = () => (rand() < 0.9 ? pick(rand, leafIds) : pick(rand, componentIds));

  const symptomCount = Math.max(1, Math.round(size.links / 5));
  const symptoms = Array.from({ length: symptomCount }, (_, i) => ({
    id: `s${i}`,
    leak: between(rand, 0.01, 0.2),
  }));
  const links: Model["links"] = [];
  const seen = new Set<string>();
  while (links.length < size.links) {
    const symptomId = `s${Math.floor(rand() * symptomCount)}`;
    const causeId = causeFor();
    if (seen.has(`${symptomId}|${causeId}`)) continue;
    seen.add(`${symptomId}|${causeId}`);
    links.push({ symptomId, causeId, p: between(rand, 0.05, 0.95) });
  }
  const skills = ["apprentice", "technician", "senior"] as const;
  const checks: Model["checks"] = Array.from({ length: size.checks }, (_, i) => {
    const on = new Set<string>();
    const n = 1 + Math.floor(rand() * 4);
    while (on.size < n) on.add(causeFor());
    return {
      id: `k${i}`,
      cost: Math.round(between(rand, 5, 100)),
      falseAlarm: between(rand, 0.01, 0.1),
      skill: pick(rand, skills),
      bears: [...on].map((causeId) => ({ causeId, pFail: between(rand, 0.6, 0.99) })),
    };
  });

  const observations: Evidence["observations"] = [];
  const findings: Evidence["findings"] = [];
  const used = new Set<string>();
  for (
    let tries = 0;
    observations.length + findings.length < size.evidence && tries < 100 * size.evidence;
    tries++
  ) {
    if (rand() < 0.7 || size.checks === 0) {
      const symptomId = `s${Math.floor(rand() * symptomCount)}`;
      if (used.has(symptomId)) continue;
      used.add(symptomId);
      observations.push({ symptomId, present: rand() < 0.6, source: rand() < 0.5 ? "owner" : "technician" });
    } else {
      const checkId = `k${Math.floor(rand() * size.checks)}`;
      if (used.has(checkId)) continue;
      used.add(checkId);
      findings.push({ checkId, result: rand() < 0.4 ? "fail" : "pass" });
    }
  }
  return { model: { causes, symptoms, links, checks }, evidence: { observations, findings } };
}
