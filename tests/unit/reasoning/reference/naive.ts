// A straightforward reference implementation of the same model: the formulas written out with
// arrays, find() and nested loops over every hypothesis, no index maps, no sparsity tricks.
// It is the oracle the fast engine is tested against and the baseline the benchmark compares
// with. (Evidence here must not repeat a symptom or check; the generator never does.)
import type { Evidence, Model } from "~/reasoning";

const SKILLS = ["apprentice", "technician", "senior"];

export function naiveDiagnose(
  model: Model,
  evidence: Evidence,
  u = 0.05,
  r = 0.7,
  maxSkill = "senior",
  rho = 0.04,
) {
  const leaves = model.causes.filter((c) => !model.causes.some((d) => d.parentId === c.id));
  const chainOf = (id: string): string[] => {
    const chain = [id];
    let c = model.causes.find((x) => x.id === id);
    while (c?.parentId) {
      chain.push(c.parentId);
      c = model.causes.find((x) => x.id === c!.parentId);
    }
    return chain; // the leaf first, then its ancestors: nearest first
  };
  const chains = leaves.map((l) => chainOf(l.id));
  const total = leaves.reduce((s, l) => s + l.prior, 0);
  const prior = [...leaves.map((l) => ((1 - u) * l.prior) / total), u]; // last: not in the knowledge base
  const H = prior.length;

  // Likelihood vectors, one per piece of evidence, in order: observations, then findings.
  const liks: { key: string; lik: number[] }[] = [];
  for (const o of evidence.observations) {
    const symptom = model.symptoms.find((s) => s.id === o.symptomId)!;
    const mine = model.links.filter((l) => l.symptomId === o.symptomId);
    const figure = (h: number) => {
      // "not in the knowledge base" shows a symptom with its own figure, else at least rho
      if (h === H - 1) return symptom.unlisted ?? Math.max(symptom.leak, rho);
      for (const a of chains[h]) {
        const link = mine.find((l) => l.causeId === a);
        if (link) return link.p;
      }
      return symptom.leak;
    };
    let lik = prior.map((_, h) => (o.present ? figure(h) : 1 - figure(h)));
    if (o.source === "owner") {
      const marginal = lik.reduce((s, v, h) => s + prior[h] * v, 0);
      lik = lik.map((v) => r * v + (1 - r) * marginal);
    }
    liks.push({ key: `symptom:${o.symptomId}`, lik });
  }
  const checkLik = (checkId: string) => {
    const check = model.checks.find((k) => k.id === checkId)!;
    return prior.map((_, h) => {
      if (h === H - 1) return check.falseAlarm;
      for (const a of chains[h]) {
        const b = check.bears.find((x) => x.causeId === a);
        if (b) return b.pFail;
      }
      return check.falseAlarm;
    });
  };
  for (const f of evidence.findings) {
    const q = checkLik(f.checkId);
    liks.push({ key: `check:${f.checkId}`, lik: q.map((v) => (f.result === "fail" ? v : 1 - v)) });
  }

  // Posterior: log prior + Σ log likelihood, normalised.
  const logW = prior.map((p, h) => liks.reduce((s, e) => s + Math.log(e.lik[h]), Math.log(p)));
  const max = Math.max(...logW);
  const z = logW.reduce((s, w) => s + Math.exp(w - max), 0);
  const post = logW.map((w) => Math.exp(w - max) / z);

  // Contributions: log P(e|c)/P(e|¬c), with ¬c weighted by the posterior just before e.
  const contributions = leaves.map(() => ({}) as Record<string, number>);
  let pi = [...prior];
  for (const { key, lik } of liks) {
    const m = pi.reduce((s, p, h) => s + p * lik[h], 0);
    leaves.forEach((_, c) => {
      contributions[c][key] = Math.log(lik[c] / ((m - pi[c] * lik[c]) / (1 - pi[c])));
    });
    pi = pi.map((p, h) => (p * lik[h]) / m);
  }
  const causes = leaves
    .map((l, c) => ({ id: l.id, probability: post[c], contributions: contributions[c] }))
    .sort((a, b) => b.probability - a.probability || (a.id < b.id ? -1 : 1));

  // Plan: every check not yet done, by P(fails because of a fault it bears on)/cost; ECR with
  // survival per hypothesis, where only a check that bears on a hypothesis can find it (a false
  // alarm finds nothing and the search goes on). The value order is then improved by neighbour
  // swaps, each judged on the whole order's ECR; if it still costs more than cheapest-first,
  // cheapest-first improved the same way is the plan.
  const remaining = model.checks
    .filter((k) => !evidence.findings.some((f) => f.checkId === k.id))
    .map((k) => {
      const q = checkLik(k.id);
      const borne = prior.map(
        (_, h) => h !== H - 1 && chains[h].some((a) => k.bears.some((b) => b.causeId === a)),
      );
      const pFind = post.reduce((s, p, h) => s + (borne[h] ? p * q[h] : 0), 0);
      return { check: k, q, borne, pFind, ratio: pFind / k.cost };
    })
    .sort((a, b) => b.ratio - a.ratio || a.check.cost - b.check.cost || (a.check.id < b.check.id ? -1 : 1));
  const within = remaining.filter(
    (s) => SKILLS.indexOf(s.check.skill ?? "technician") <= SKILLS.indexOf(maxSkill),
  );
  const ecr = (order: typeof within) => {
    let survive = [...post];
    let cost = 0;
    for (const s of order) {
      cost += s.check.cost * survive.reduce((a, b) => a + b, 0);
      survive = survive.map((v, h) => (s.borne[h] ? v * (1 - s.q[h]) : v));
    }
    return cost;
  };
  // One pass walks the first 64 steps with the survival of every hypothesis written out; swapping
  // steps i and i+1 changes only their two terms: C_a·R + C_b·R_a against C_b·R + C_a·R_b.
  const improve = (start: typeof within) => {
    const order = [...start];
    for (let pass = 0; pass < 8; pass++) {
      let swapped = false;
      let survive = [...post];
      for (let i = 0; i + 1 < Math.min(order.length, 64); i++) {
        const [a, b] = [order[i], order[i + 1]];
        const r = survive.reduce((x, y) => x + y, 0);
        const after = (s: (typeof order)[number]) =>
          survive.reduce((x, v, h) => x + (s.borne[h] ? v * (1 - s.q[h]) : v), 0);
        const keep = a.check.cost * r + b.check.cost * after(a);
        const swap = b.check.cost * r + a.check.cost * after(b);
        if (swap < keep - 1e-12 * (a.check.cost + b.check.cost)) {
          [order[i], order[i + 1]] = [b, a];
          swapped = true;
        }
        const ran = order[i];
        survive = survive.map((v, h) => (ran.borne[h] ? v * (1 - ran.q[h]) : v));
      }
      if (!swapped) break;
    }
    return order;
  };
  const cheapest = [...within].sort(
    (a, b) => a.check.cost - b.check.cost || (a.check.id < b.check.id ? -1 : 1),
  );
  let shown = improve(within);
  if (ecr(shown) > ecr(cheapest)) {
    const alt = improve(cheapest);
    if (ecr(alt) < ecr(shown)) shown = alt;
  }
  const steps = shown.map((s) => ({ checkId: s.check.id, pFind: s.pFind, ratio: s.ratio }));
  return {
    causes,
    unlisted: post[H - 1],
    steps,
    expectedCost: ecr(shown),
    cheapestFirstExpectedCost: ecr(cheapest),
  };
}
