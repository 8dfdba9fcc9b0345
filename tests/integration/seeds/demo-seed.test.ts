import { count, eq, sql } from "drizzle-orm";
import { describe, expect, it } from "vitest";
import { causes, checks, members, symptomLinks, symptoms, workshops } from "~/db/schema";
import { seedDemo } from "../../../seeds/demo";
import { testDb } from "../../setup/integration-worker";

const TABLES = [
  "workshops",
  "users",
  "identities",
  "members",
  "owners",
  "vehicles",
  "mileage_readings",
  "symptoms",
  "causes",
  "checks",
  "symptom_links",
  "check_links",
  "cases",
  "observations",
  "findings",
  "audit_log",
];

async function rowCounts() {
  const db = testDb();
  const out: Record<string, number> = {};
  for (const t of TABLES) {
    const r = await db.execute<{ n: number }>(sql.raw(`select count(*)::int as n from ${t}`));
    out[t] = r.rows[0].n;
  }
  return out;
}

describe("demo seed", () => {
  it("holds two workshops with members of every role", async () => {
    const db = testDb();
    const ws = await db.select({ id: workshops.id, slug: workshops.slug }).from(workshops);
    expect(ws.map((w) => w.slug).sort()).toEqual(["bramblegate", "saltmarsh"]);
    const bramble = ws.find((w) => w.slug === "bramblegate")!;
    const roles = await db
      .select({ role: members.role })
      .from(members)
      .where(eq(members.workshopId, bramble.id));
    expect(new Set(roles.map((r) => r.role))).toEqual(
      new Set(["apprentice", "technician", "senior", "advisor", "admin"]),
    );
  });

  it("copies the starter knowledge base into each workshop at the sizes promised", async () => {
    const db = testDb();
    const [w] = await db
      .select({ id: workshops.id })
      .from(workshops)
      .where(eq(workshops.slug, "bramblegate"));
    const [[s], [leaves], [k], [l]] = await Promise.all([
      db.select({ n: count() }).from(symptoms).where(eq(symptoms.workshopId, w.id)),
      db
        .select({ n: count() })
        .from(causes)
        .where(sql`${causes.workshopId} = ${w.id} and ${causes.level} = 'failure_mode'`),
      db.select({ n: count() }).from(checks).where(eq(checks.workshopId, w.id)),
      db.select({ n: count() }).from(symptomLinks).where(eq(symptomLinks.workshopId, w.id)),
    ]);
    expect(s.n).toBeGreaterThanOrEqual(30);
    expect(leaves.n).toBeGreaterThanOrEqual(40);
    expect(k.n).toBeGreaterThanOrEqual(50);
    expect(l.n).toBeGreaterThan(s.n);
  });

  it("is idempotent: seeding again adds and changes nothing", async () => {
    const before = await rowCounts();
    await seedDemo(testDb(), new Date("2026-12-01T09:00:00Z"));
    expect(await rowCounts()).toEqual(before);
  });
});

describe("data model", () => {
  it("gives every workshop-owned table a NOT NULL workshop_id (the distribution column)", async () => {
    const r = await testDb().execute<{ table_name: string; is_nullable: string }>(sql`
      select table_name, is_nullable from information_schema.columns
      where table_schema = 'public' and column_name = 'workshop_id'`);
    const byTable = new Map(r.rows.map((x) => [x.table_name, x.is_nullable]));
    for (const t of [
      "owners",
      "vehicles",
      "mileage_readings",
      "members",
      "invitations",
      "symptoms",
      "causes",
      "checks",
      "symptom_links",
      "check_links",
      "cases",
      "observations",
      "findings",
    ]) {
      expect(byTable.get(t), t).toBe("NO");
    }
  });

  it("refuses probabilities outside [0, 1] and negative costs", async () => {
    const db = testDb();
    const [w] = await db.select({ id: workshops.id }).from(workshops).limit(1);
    await expect(
      db.insert(symptoms).values({
        workshopId: w.id,
        key: "bad-leak",
        name: "Bad",
        system: "brakes",
        kind: "noise",
        leak: 1.2,
      }),
    ).rejects.toMatchObject({ cause: { constraint: "symptoms_leak_range" } });
    await expect(
      db.insert(checks).values({
        workshopId: w.id,
        key: "bad-cost",
        name: "Bad",
        minutes: -5,
        skill: "apprentice",
        resultKind: "pass_fail",
        falseAlarm: 0.1,
      }),
    ).rejects.toMatchObject({ cause: { constraint: "checks_costs_nonneg" } });
    await expect(
      db.insert(checks).values({
        workshopId: w.id,
        key: "bad-rule",
        name: "Bad",
        minutes: 5,
        skill: "apprentice",
        resultKind: "measurement",
        falseAlarm: 0.1,
      }),
    ).rejects.toMatchObject({ cause: { constraint: "checks_measurement_rule" } });
  });
});
