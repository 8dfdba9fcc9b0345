import { and, asc, eq } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import type { Member } from "~/auth/guards.server";
import type { Db } from "~/db/client.server";
import { cases, causes, checks, findings, members, observations, owners, symptoms, users, vehicles, workshops } from "~/db/schema";
import { refuse, requireId } from "~/http.server";

const assigned = alias(members, "assigned");
const assignedUser = alias(users, "assigned_user");

/**
 * Everything a case screen shows, in three queries however many observations and findings there
 * are: the case with its vehicle, owner and workshop; its observations; its findings. A case of
 * another workshop is "not found", never "forbidden", so ids reveal nothing.
 */
export async function loadCase(db: Db, member: Pick<Member, "workshopId">, caseId: string) {
  requireId(caseId, "No such case in this workshop.");
  const [row] = await db
    .select({
      id: cases.id,
      number: cases.number,
      state: cases.state,
      complaint: cases.complaint,
      mileageKm: cases.mileageKm,
      needsSenior: cases.needsSenior,
      version: cases.version,
      openedAt: cases.openedAt,
      concludedAt: cases.concludedAt,
      conclusionCauseId: cases.conclusionCauseId,
      conclusionCause: causes.name,
      conclusionNotes: cases.conclusionNotes,
      concludedById: cases.concludedById,
      signedOffById: cases.signedOffById,
      assignedMemberId: cases.assignedMemberId,
      assignedName: assignedUser.name,
      vehicle: { id: vehicles.id, registration: vehicles.registration, vin: vehicles.vin, make: vehicles.make, model: vehicles.model, year: vehicles.year, engine: vehicles.engine, fuelType: vehicles.fuelType, drivetrain: vehicles.drivetrain },
      owner: { id: owners.id, name: owners.name, phone: owners.phone, email: owners.email },
      workshop: { id: workshops.id, kbVersion: workshops.kbVersion, labourRatePerHour: workshops.labourRatePerHour, currency: workshops.currency, units: workshops.units },
    })
    .from(cases)
    .innerJoin(vehicles, eq(vehicles.id, cases.vehicleId))
    .innerJoin(owners, eq(owners.id, vehicles.ownerId))
    .innerJoin(workshops, eq(workshops.id, cases.workshopId))
    .leftJoin(causes, eq(causes.id, cases.conclusionCauseId))
    .leftJoin(assigned, eq(assigned.id, cases.assignedMemberId))
    .leftJoin(assignedUser, eq(assignedUser.id, assigned.userId))
    .where(and(eq(cases.id, caseId), eq(cases.workshopId, member.workshopId)));
  if (!row) refuse(404, "No such case in this workshop.");

  const [obs, fnd] = await Promise.all([
    db
      .select({ id: observations.id, symptomId: observations.symptomId, name: symptoms.name, present: observations.present, source: observations.source, note: observations.note, recordedAt: observations.recordedAt, by: users.name })
      .from(observations)
      .innerJoin(symptoms, eq(symptoms.id, observations.symptomId))
      .leftJoin(members, eq(members.id, observations.recordedById))
      .leftJoin(users, eq(users.id, members.userId))
      .where(and(eq(observations.caseId, caseId), eq(observations.workshopId, member.workshopId)))
      .orderBy(asc(observations.recordedAt), asc(observations.id)),
    db
      .select({ id: findings.id, checkId: findings.checkId, name: checks.name, result: findings.result, reading: findings.reading, note: findings.note, recordedAt: findings.recordedAt, by: users.name })
      .from(findings)
      .innerJoin(checks, eq(checks.id, findings.checkId))
      .leftJoin(members, eq(members.id, findings.recordedById))
      .leftJoin(users, eq(users.id, members.userId))
      .where(and(eq(findings.caseId, caseId), eq(findings.workshopId, member.workshopId)))
      .orderBy(asc(findings.recordedAt), asc(findings.id)),
  ]);
  return { ...row, observations: obs, findings: fnd };
}

export type CaseBundle = Awaited<ReturnType<typeof loadCase>>;

export function evidenceOf(c: Pick<CaseBundle, "observations" | "findings">) {
  return {
    observations: c.observations.map((o) => ({ symptomId: o.symptomId, present: o.present, source: o.source })),
    findings: c.findings.map((f) => ({ checkId: f.checkId, result: f.result })),
  };
}
