// The workshop's cases with a confirmed cause, as the impact preview ranks them again, and the
// preview of one link change against them (app/kb/impact.ts does the arithmetic).
import { and, desc, eq, inArray, isNotNull } from "drizzle-orm";
import type { Db } from "~/db/client.server";
import { cases, causes, findings, observations, vehicles, workshops } from "~/db/schema";
import { impactOf, type ImpactCase, type KbChange, withChange } from "./impact";
import { loadKnowledge } from "./knowledge.server";
import { vehicleFacts } from "./model";
import { outcomesByFuel } from "./outcomes.server";
import { testImpactCases } from "./test-cases.server";

// The newest cases with a confirmed cause: enough to show a change's effect, few enough that one
// preview stays well under a second of ranking.
export const IMPACT_CASES = 100;

async function confirmedCases(db: Db, workshopId: string): Promise<ImpactCase[]> {
  const rows = await db
    .select({
      id: cases.id,
      number: cases.number,
      mileageKm: cases.mileageKm,
      answerId: cases.conclusionCauseId,
      answerName: causes.name,
      fuelType: vehicles.fuelType,
      drivetrain: vehicles.drivetrain,
      year: vehicles.year,
    })
    .from(cases)
    .innerJoin(vehicles, eq(vehicles.id, cases.vehicleId))
    .innerJoin(causes, eq(causes.id, cases.conclusionCauseId))
    .where(
      and(
        eq(cases.workshopId, workshopId),
        inArray(cases.state, ["concluded", "closed"]),
        isNotNull(cases.conclusionCauseId),
      ),
    )
    .orderBy(desc(cases.concludedAt), desc(cases.number))
    .limit(IMPACT_CASES);
  if (rows.length === 0) return [];
  const ids = rows.map((r) => r.id);
  const [obs, found] = await Promise.all([
    db
      .select({
        caseId: observations.caseId,
        symptomId: observations.symptomId,
        present: observations.present,
        source: observations.source,
      })
      .from(observations)
      .where(inArray(observations.caseId, ids)),
    db
      .select({ caseId: findings.caseId, checkId: findings.checkId, result: findings.result })
      .from(findings)
      .where(inArray(findings.caseId, ids)),
  ]);
  return rows.map((r) => ({
    id: r.id,
    number: r.number,
    answerId: r.answerId!,
    answerName: r.answerName,
    fuel: r.fuelType,
    facts: vehicleFacts({
      fuelType: r.fuelType,
      drivetrain: r.drivetrain,
      year: r.year,
      mileageKm: r.mileageKm,
    }),
    evidence: {
      observations: obs.filter((o) => o.caseId === r.id).map(({ caseId: _c, ...o }) => o),
      findings: found.filter((f) => f.caseId === r.id).map(({ caseId: _c, ...f }) => f),
    },
  }));
}

/** What one link change would do to the workshop's confirmed cases' rankings. */
export async function previewChange(db: Db, workshopId: string, change: KbChange) {
  const [w] = await db
    .select({ kbVersion: workshops.kbVersion, labourRate: workshops.labourRatePerHour })
    .from(workshops)
    .where(eq(workshops.id, workshopId));
  const kb = await loadKnowledge(db, workshopId, w.kbVersion);
  const [list, tests, outcomes] = await Promise.all([
    confirmedCases(db, workshopId),
    testImpactCases(db, workshopId),
    outcomesByFuel(db, workshopId),
  ]);
  const changed = withChange(kb, change);
  return {
    ...impactOf(kb, changed, list, w.labourRate, outcomes),
    tests: impactOf(kb, changed, tests, w.labourRate, outcomes),
  };
}
