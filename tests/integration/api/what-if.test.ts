// POST /api/what-if: stateless ranking, plan and what-if for any model. Exact posteriors on the
// dentist example of Russell & Norvig, Artificial Intelligence: A Modern Approach (ch. 13), whose
// full joint distribution over Cavity, Toothache and Catch is
//                 toothache          ¬toothache
//              catch   ¬catch      catch   ¬catch
//   cavity     .108     .012       .072     .008
//   ¬cavity    .016     .064       .144     .576
// Marginals from the table (our arithmetic):
//   P(cavity) = .108 + .012 + .072 + .008 = .2
//   P(t | cavity)  = (.108 + .012) / .2 = .6     P(t | ¬cavity)  = (.016 + .064) / .8 = .1
//   P(c | cavity)  = (.108 + .072) / .2 = .9     P(c | ¬cavity)  = (.016 + .144) / .8 = .2
// and Toothache and Catch are independent given Cavity in the table, so a single-fault model with
// causes cavity / no-cavity and these likelihoods reproduces it exactly.
import { describe, expect, it } from "vitest";
import { action } from "~/routes/api/what-if";
import { testDb } from "../../setup/integration-worker";
import { cookieFor, isCleanError, request, run, snapshot, caseId, type Answer } from "./helpers";

type Ranked = { id: string; probability: number }[];
const prob = (a: Answer, id: string) =>
  (a.body.ranking as { causes: Ranked }).causes.find((c) => c.id === id)?.probability ?? NaN;

const causes = [
  { id: "cavity", parentId: null, prior: 0.2 },
  { id: "no_cavity", parentId: null, prior: 0.8 },
];
// Leaks (P(symptom | no listed cause)) only touch unlinked leaves and "not in the knowledge
// base"; both leaves are linked and unlistedPrior is 0, so any leak gives the same answer.
const symptoms = [
  { id: "toothache", leak: 0.5 },
  { id: "catch", leak: 0.5 },
];
const links = [
  { symptomId: "toothache", causeId: "cavity", p: 0.6 },
  { symptomId: "toothache", causeId: "no_cavity", p: 0.1 },
  { symptomId: "catch", causeId: "cavity", p: 0.9 },
  { symptomId: "catch", causeId: "no_cavity", p: 0.2 },
];
const dentist = { causes, symptoms, links, checks: [] as unknown[] };
const seen = (...ids: string[]) => ({
  observations: ids.map((id) => ({ symptomId: id, present: true, source: "technician" })),
  findings: [],
});
const exact = { unlistedPrior: 0 };

async function whatIf(body: unknown, login = "priya-hale") {
  return run(
    action,
    testDb(),
    request("/api/what-if", { cookie: await cookieFor(testDb(), login), json: body }),
    {},
  );
}

describe("POST /api/what-if on the dentist model (Russell & Norvig ch. 13)", () => {
  it("P(cavity | toothache) = .12 / .2 = 0.6", async () => {
    // .2·.6 = .12 and .8·.1 = .08; .12 / (.12 + .08) = 0.6 (the book's .108 + .012 over .2).
    const a = await whatIf({ model: dentist, evidence: seen("toothache"), options: exact });
    expect(a.status).toBe(200);
    expect(prob(a, "cavity")).toBeCloseTo(0.6, 12);
    expect(prob(a, "no_cavity")).toBeCloseTo(0.4, 12);
    expect(a.body.ranking).toMatchObject({ unlisted: 0 });
  });

  it("P(cavity | toothache ∧ catch) = .108 / .124 ≈ 0.8710", async () => {
    // .2·.6·.9 = .108 and .8·.1·.2 = .016: .108 / (.108 + .016) = .108 / .124 = 0.870967741935…
    const a = await whatIf({ model: dentist, evidence: seen("toothache", "catch"), options: exact });
    expect(prob(a, "cavity")).toBeCloseTo(0.108 / 0.124, 12);
    expect(prob(a, "cavity")).toBeCloseTo(0.871, 3);
  });

  it("P(cavity | ¬toothache) = .08 / .8 = 0.1", async () => {
    // .2·(1 − .6) = .08 and .8·(1 − .1) = .72; .08 / .8 = 0.1 (the book's .072 + .008 over .8).
    const a = await whatIf({
      model: dentist,
      evidence: { observations: [{ symptomId: "toothache", present: false }], findings: [] },
      options: exact,
    });
    expect(prob(a, "cavity")).toBeCloseTo(0.1, 12);
  });

  it("the probe's catch as a check: what-if gives both outcomes and their chance", async () => {
    // Catch as a check that fails with .9 under cavity and .2 otherwise (its false-alarm rate).
    //   P(catch | t) = .6·.9 + .4·.2 = .62                       (table: (.108 + .016) / .2)
    //   P(cavity | t, catch) = .54 / .62 = .108 / .124            → cavity on top
    //   P(no_cavity | t, ¬catch) = (.4·.8) / (1 − .62) = .32 / .38 = .064 / .076 → no_cavity on top
    //   the plan's pFind, P(the probe catches because of a cavity | t) = .6·.9 = .54
    const model = {
      causes,
      symptoms: [symptoms[0]],
      links: links.slice(0, 2),
      checks: [{ id: "probe", cost: 1, falseAlarm: 0.2, bears: [{ causeId: "cavity", pFail: 0.9 }] }],
    };
    const a = await whatIf({ model, evidence: seen("toothache"), checkId: "probe", options: exact });
    expect(a.status).toBe(200);
    const w = a.body.whatIf as {
      pFail: number;
      ifFail: { topCauseId: string; probability: number };
      ifPass: { topCauseId: string; probability: number };
    };
    expect(w.pFail).toBeCloseTo(0.62, 12);
    expect(w.ifFail.topCauseId).toBe("cavity");
    expect(w.ifFail.probability).toBeCloseTo(0.108 / 0.124, 12);
    expect(w.ifPass.topCauseId).toBe("no_cavity");
    expect(w.ifPass.probability).toBeCloseTo(0.064 / 0.076, 12);
    const plan = a.body.plan as { steps: { checkId: string; pFind: number }[] };
    expect(plan.steps.map((s) => s.checkId)).toEqual(["probe"]);
    // pFind leaves false alarms out (app/reasoning/plan.ts): P(cavity ∧ catch | t) = .6·.9 = .54,
    // the table's .108 / .2.
    expect(plan.steps[0].pFind).toBeCloseTo(0.54, 12);
  });

  it("stores nothing", async () => {
    const before = await snapshot(testDb(), caseId("b1"));
    await whatIf({ model: dentist, evidence: seen("toothache"), options: exact });
    expect(await snapshot(testDb(), caseId("b1"))).toEqual(before);
  });
});

describe("POST /api/what-if refuses invalid models with 400", () => {
  const refused = async (body: unknown) => {
    const a = await whatIf(body);
    expect(a.status, JSON.stringify(a.body)).toBe(400);
    expect(isCleanError(a)).toBe(true);
    return a;
  };
  const withLinks = (l: typeof links) => ({ model: { ...dentist, links: l }, evidence: seen("toothache") });

  it("a probability of 1.5, pointing at the field", async () => {
    const a = await refused(withLinks([{ ...links[0], p: 1.5 }, ...links.slice(1)]));
    expect((a.body.issues as { path: string }[])[0].path).toBe("model.links.0.p");
  });

  it("a negative check cost", async () => {
    const model = { ...dentist, checks: [{ id: "probe", cost: -5, falseAlarm: 0.2, bears: [] }] };
    const a = await refused({ model, evidence: seen() });
    expect((a.body.issues as { path: string }[])[0].path).toBe("model.checks.0.cost");
  });

  it("a link to a cause that is not in the model (UNKNOWN_ID, naming it)", async () => {
    const a = await refused(withLinks([...links, { symptomId: "toothache", causeId: "caries", p: 0.5 }]));
    expect(a.body.code).toBe("UNKNOWN_ID");
    expect(a.body.error).toContain("caries");
  });

  it("a cause tree that loops (CYCLE)", async () => {
    const loop = [
      { id: "mouth", parentId: "tooth", prior: 0 },
      { id: "tooth", parentId: "mouth", prior: 0 },
      { id: "cavity", parentId: "tooth", prior: 0.2 },
      { id: "no_cavity", parentId: null, prior: 0.8 },
    ];
    const a = await refused({ model: { ...dentist, causes: loop }, evidence: seen("toothache") });
    expect(a.body.code).toBe("CYCLE");
  });

  it("evidence naming an unknown symptom, and a what-if for a check not in the model", async () => {
    expect((await refused({ model: dentist, evidence: seen("earache") })).body.code).toBe("UNKNOWN_ID");
    expect((await refused({ model: dentist, evidence: seen("toothache"), checkId: "x-ray" })).body.code).toBe(
      "UNKNOWN_ID",
    );
  });

  it("an unlistedPrior of 1 or more", async () => {
    await refused({ model: dentist, evidence: seen("toothache"), options: { unlistedPrior: 1 } });
  });
});

describe("POST /api/what-if access", () => {
  it("401 without a session and 403 from another origin", async () => {
    const body = { model: dentist, evidence: seen("toothache") };
    const anon = await run(action, testDb(), request("/api/what-if", { json: body }), {});
    expect(anon.status).toBe(401);
    const foreign = await run(
      action,
      testDb(),
      request("/api/what-if", {
        cookie: await cookieFor(testDb(), "priya-hale"),
        json: body,
        origin: "http://evil.example",
      }),
      {},
    );
    expect(foreign.status).toBe(403);
    expect(isCleanError(foreign)).toBe(true);
  });
});
