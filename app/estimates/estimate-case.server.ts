import { and, eq } from "drizzle-orm";
import type { Db, Tx } from "~/db/client.server";
import {
  cases,
  causes,
  checkLinks,
  checks,
  findings,
  observations,
  owners,
  symptomLinks,
  symptoms,
  vehicles,
  workshops,
} from "~/db/schema";
import type { UnitSystem } from "~/domain/vehicles";
import { refuse } from "~/http/errors.server";

/** What the estimate and the owner summary are built from: the case, its owner, the confirmed cause and its evidence. */
export async function loadEstimateCase(db: Db | Tx, workshopId: string, caseId: string) {
  const [row] = await db
    .select({
      id: cases.id,
      number: cases.number,
      state: cases.state,
      complaint: cases.complaint,
      assignedMemberId: cases.assignedMemberId,
      openedById: cases.openedById,
      causeId: cases.conclusionCauseId,
      registration: vehicles.registration,
      vehicle: vehicles.make,
      model: vehicles.model,
      year: vehicles.year,
      ownerName: owners.name,
      ownerEmail: owners.email,
      ownerPhone: owners.phone,
      workshopName: workshops.name,
      currency: workshops.currency,
      taxRate: workshops.taxRate,
      labourRatePerHour: workshops.labourRatePerHour,
      pricesIncludeTax: workshops.pricesIncludeTax,
      units: workshops.units,
    })
    .from(cases)
    .innerJoin(vehicles, eq(vehicles.id, cases.vehicleId))
    .innerJoin(owners, eq(owners.id, vehicles.ownerId))
    .innerJoin(workshops, eq(workshops.id, cases.workshopId))
    .where(and(eq(cases.id, caseId), eq(cases.workshopId, workshopId)));
  if (!row) refuse(404, "No such case in this workshop.");
  const cause = row.causeId
    ? (
        await db
          .select({
            id: causes.id,
            name: causes.name,
            priority: causes.priority,
            ownerDescription: causes.ownerDescription,
            ifLeft: causes.ifLeft,
            repairMinutes: causes.repairMinutes,
            partsCost: causes.partsCost,
          })
          .from(causes)
          .where(eq(causes.id, row.causeId))
      )[0]
    : undefined;
  return {
    ...row,
    vehicleName: `${row.year} ${row.vehicle} ${row.model}`,
    cause,
    units: row.units as UnitSystem,
  };
}
export type EstimateCase = Awaited<ReturnType<typeof loadEstimateCase>>;

/**
 * The case's own evidence that bears on a cause: failed checks linked to it (with their readings
 * and limits) and present symptoms linked to it, in the order they were recorded.
 */
export async function evidenceFor(db: Db | Tx, caseId: string, causeId: string) {
  const failed = await db
    .select({
      name: checks.name,
      reading: findings.reading,
      rule: checks.rule,
      minutes: checks.minutes,
    })
    .from(findings)
    .innerJoin(checks, eq(checks.id, findings.checkId))
    .innerJoin(checkLinks, and(eq(checkLinks.checkId, checks.id), eq(checkLinks.causeId, causeId)))
    .where(and(eq(findings.caseId, caseId), eq(findings.result, "fail")))
    .orderBy(findings.recordedAt);
  const present = await db
    .select({ name: symptoms.name, source: observations.source })
    .from(observations)
    .innerJoin(symptoms, eq(symptoms.id, observations.symptomId))
    .innerJoin(symptomLinks, and(eq(symptomLinks.symptomId, symptoms.id), eq(symptomLinks.causeId, causeId)))
    .where(and(eq(observations.caseId, caseId), eq(observations.present, true)))
    .orderBy(observations.recordedAt);
  return { failed, present };
}
export type CaseEvidence = Awaited<ReturnType<typeof evidenceFor>>;

/** Minutes of every check done on the case: what the diagnostic fee charges for. */
export async function checkMinutes(db: Db | Tx, caseId: string) {
  const rows = await db
    .select({ minutes: checks.minutes })
    .from(findings)
    .innerJoin(checks, eq(checks.id, findings.checkId))
    .where(eq(findings.caseId, caseId));
  return rows.reduce((s, r) => s + r.minutes, 0);
}
