// Several faults at once: once a cause is confirmed, the evidence it explains is set aside and the
// rest is ranked as a second fault. The single-fault model stays as it is; it is applied again to
// what is left. An item is explained by a confirmed cause when that cause makes it more likely
// than the background does (a present symptom it produces more often than the symptom's leak, a
// failed or out-of-limit check it fails more often than the false-alarm rate) and at least as
// likely as any other candidate does: a symptom the confirmed cause shows only now and then but
// another cause shows often is left for the second fault. Absent symptoms and passed checks are
// kept (a confirmed cause makes them less likely, never more): they still rule causes out. The confirmed causes themselves get prior 0,
// the other candidates and "not in the knowledge base" share their prior in the same proportions.
import { toCompiled, type CompiledModel } from "./compiled";
import { fail } from "./errors";
import { resolveEvidence } from "./evidence";
import type { ModelIndex } from "./model-index";
import { resolveOptions, type PlanOptions } from "./options";
import { planFrom, type Plan } from "./plan";
import { computePosterior } from "./posterior";
import { rankFrom, type Ranking } from "./rank";
import type { Evidence, Model } from "./schema";

export type SecondFault = {
  ranking: Ranking; // without the confirmed causes
  plan: Plan; // the checks not yet done, for the second fault
  setAside: string[]; // evidence keys ("symptom:<id>", "check:<id>") the confirmed causes explain
  kept: Evidence; // the evidence the second ranking uses
};

export function rankSecondFault(
  model: Model | CompiledModel,
  evidence: Evidence,
  confirmed: readonly string[],
  options?: PlanOptions,
): SecondFault {
  const opts = resolveOptions(options);
  const compiled = toCompiled(model);
  const base = compiled.scoped(opts.unlistedPrior);
  if (!Array.isArray(confirmed) || confirmed.length === 0)
    fail("INVALID_INPUT", "Name at least one confirmed cause to look for a second fault.");
  const leaves = confirmed.map((id) => {
    const c = base.tree.causeIndex.get(id);
    if (c === undefined) fail("UNKNOWN_ID", `The confirmed cause "${id}" is not in the model.`);
    const leaf = base.tree.leafOf[c];
    if (leaf < 0)
      fail(
        "INVALID_INPUT",
        `"${id}" is a group of causes, not a failure mode; confirm the failure mode itself.`,
      );
    return leaf;
  });

  const items = resolveEvidence(base, evidence, opts.ownerReliability, opts.unlistedSymptomRate);
  const explained = new Set<string>();
  const isConfirmed = new Uint8Array(base.leafCount);
  for (const leaf of leaves) isConfirmed[leaf] = 1;
  for (const item of items) {
    // The best figure among the confirmed causes, against the best among all the others
    // (unlinked ones, and "not in the knowledge base", have the default).
    let mine = -1;
    let others = Math.max(item.defaultLik, item.unlistedLik);
    for (let j = 0; j < item.leaves.length; j++) {
      if (isConfirmed[item.leaves[j]]) mine = Math.max(mine, item.liks[j]);
      else others = Math.max(others, item.liks[j]);
    }
    if (mine > item.defaultLik && mine >= others) explained.add(item.key);
  }
  const kept: Evidence = {
    observations: evidence.observations.filter((o) => !explained.has(`symptom:${o.symptomId}`)),
    findings: evidence.findings.filter((f) => !explained.has(`check:${f.checkId}`)),
  };

  const index = withoutLeaves(base, leaves);
  const keptItems = items.filter((i) => !explained.has(i.key));
  const post = computePosterior(index, keptItems);
  const ranking = rankFrom(compiled, index, keptItems, post);
  const gone = new Set(confirmed);
  ranking.causes = ranking.causes.filter((c) => !gone.has(c.id));
  // Checks already done stay done: the plan is built from all the evidence's findings.
  const plan = planFrom(compiled, index, evidence, post, opts.maxSkill);
  return { ranking, plan, setAside: items.filter((i) => explained.has(i.key)).map((i) => i.key), kept };
}

/** The index with the given leaves at prior 0 and every other hypothesis scaled up to sum 1. */
function withoutLeaves(index: ModelIndex, leaves: readonly number[]): ModelIndex {
  const prior = index.prior.slice();
  let removed = 0;
  for (const leaf of leaves) {
    removed += prior[leaf];
    prior[leaf] = 0;
  }
  const rest = 1 - removed;
  if (!(rest > 0)) fail("ZERO_PRIOR", "Nothing is left to rank once the confirmed causes are set aside.");
  for (let h = 0; h < prior.length; h++) prior[h] /= rest;
  return { ...index, prior, logPrior: prior.map(Math.log) };
}
