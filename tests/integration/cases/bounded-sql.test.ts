// Loading a case costs a fixed number of SQL statements however much evidence it has: no query
// per observation or finding (the N+1 pattern). Counted with createDb's onQuery hook.
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { memberContext } from "~/auth/guards.server";
import { createDb, type Db } from "~/db/client.server";
import { cases, checks, findings, observations, symptoms } from "~/db/schema";
import { nextKbVersion } from "~/kb/version.server";
import { loader as caseLoader } from "~/routes/api/case";
import { loader as workbenchLoader } from "~/routes/cases/workbench";
import { testDb } from "../../setup/integration-worker";
import { BRAMBLEGATE, contextFor, cookieFor, freshCase, memberFor, request, run } from "../api/helpers";

let counted: { db: Db; end: () => Promise<void> };
let n = 0;
let small: string; // 1 finding
let large: string; // 30 findings, 10 observations
let cookie: string;

beforeAll(async () => {
  const { db, pool } = createDb(process.env.DATABASE_URL!, { max: 4, onQuery: () => n++ });
  counted = { db, end: () => pool.end() };
  cookie = await cookieFor(testDb(), "priya-hale");
  const member = await memberFor(testDb(), "priya-hale");
  // Passed checks only: a pass is possible under every hypothesis with a false-alarm rate below 1,
  // so any 30 checks make evidence the ranking accepts.
  const kbChecks = await testDb()
    .select({ id: checks.id })
    .from(checks)
    .where(eq(checks.workshopId, BRAMBLEGATE))
    .orderBy(checks.id)
    .limit(30);
  const kbSymptoms = await testDb()
    .select({ id: symptoms.id })
    .from(symptoms)
    .where(eq(symptoms.workshopId, BRAMBLEGATE))
    .orderBy(symptoms.id)
    .limit(10);
  expect(kbChecks).toHaveLength(30);
  small = await freshCase(testDb());
  large = await freshCase(testDb());
  const finding = (caseId: string, checkId: string) => ({
    workshopId: BRAMBLEGATE,
    caseId,
    checkId,
    result: "pass" as const,
    recordedById: member.memberId,
  });
  await testDb().insert(findings).values(finding(small, kbChecks[0].id));
  await testDb()
    .insert(findings)
    .values(kbChecks.map((k) => finding(large, k.id)));
  await testDb()
    .insert(observations)
    .values(
      kbSymptoms.map((s, i) => ({
        workshopId: BRAMBLEGATE,
        caseId: large,
        symptomId: s.id,
        present: i % 2 === 0,
        recordedById: member.memberId,
      })),
    );
});

afterAll(async () => {
  await counted.end();
});

/** Statements one call issues, after a warm-up that fills the knowledge-base cache. */
async function statements(call: () => Promise<unknown>) {
  await call();
  n = 0;
  await call();
  return n;
}

describe("GET /api/cases/:caseId issues a fixed number of SQL statements", () => {
  const get = (id: string) => async () => {
    const a = await run(caseLoader, counted.db, request(`/api/cases/${id}`, { cookie }), { caseId: id });
    expect(a.status).toBe(200);
    return a;
  };

  it("the same for 1 finding as for 30 findings and 10 observations", async () => {
    const one = await statements(get(small));
    const thirty = await statements(get(large));
    console.log(
      `GET /api/cases/:id SQL statements: ${one} with 1 finding, ${thirty} with 30 findings + 10 observations`,
    );
    expect((await get(large)()).body.case).toMatchObject({
      findings: expect.arrayContaining([expect.objectContaining({ result: "pass" })]),
    });
    expect(thirty).toBe(one);
    // Counted by hand from the code, with the knowledge base cached: the session with its account
    // (1, app/auth/accounts.server.ts) and the case with its observations, findings, history and
    // outcome counts (1, app/cases/case.server.ts).
    expect(one).toBe(2);
  });

  it("a version not in the cache yet adds one statement: the kept version (app/kb/version.server.ts)", async () => {
    // A new version, kept whole as every change keeps it, and the case moved on to it.
    const warm = await statements(get(small));
    const v = await testDb().transaction((tx) => nextKbVersion(tx, BRAMBLEGATE, "bounded-sql test"));
    await testDb().update(cases).set({ kbVersion: v }).where(eq(cases.id, large));
    n = 0;
    await get(large)();
    const cold = n;
    console.log(`GET /api/cases/:id SQL statements with a cold knowledge-base cache: ${cold}`);
    expect(cold - warm).toBe(1);
  });
});

describe("the case page's loader issues a fixed number of SQL statements", () => {
  it("the same for 1 finding as for 30", async () => {
    const member = await memberFor(testDb(), "priya-hale");
    const page = (id: string) => async () => {
      const context = contextFor(counted.db);
      context.set(memberContext, member);
      return workbenchLoader({
        request: request(`/cases/${id}`, { cookie }),
        params: { caseId: id },
        context,
      } as never);
    };
    const one = await statements(page(small));
    const thirty = await statements(page(large));
    console.log(`/cases/:id loader SQL statements: ${one} with 1 finding, ${thirty} with 30`);
    expect(thirty).toBe(one);
    // The member comes from the layout's middleware; the loader itself reads the case once.
    expect(one).toBe(1);
  });
});
