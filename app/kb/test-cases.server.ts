// The workshop's test cases for its knowledge base: kept from a concluded case (its complaint, the
// vehicle facts the ranking depends on, its evidence and its confirmed cause), ranked again under
// the base as it is on their page, and before and after every previewed change.
import { and, asc, eq } from "drizzle-orm";
import { audit } from "~/audit/write.server";
import type { CurrentMember } from "~/auth/guards.server";
import type { Db } from "~/db/client.server";
import { cases, causes, findings, kbTestCases, observations, vehicles, workshops } from "~/db/schema";
import { refuse, requireId } from "~/http/errors.server";
import { type ImpactCase, places } from "./impact";
import { outcomesByFuel } from "./outcomes.server";
import { kbVersion, loadKnowledge } from "./knowledge.server";
import { vehicleFacts } from "./model";

type Member = Pick<CurrentMember, "workshopId" | "userId" | "memberId">;
const NOT_FOUND = "No such test case in this workshop.";

/** Keeps a concluded case as a test case of the knowledge base, under a name of the senior's. */
export async function keepTestCase(db: Db, member: Member, caseId: string, name: string) {
  requireId(caseId, "No such case in this workshop.");
  return db.transaction(async (tx) => {
    const [c] = await tx
      .select({
        id: cases.id,
        number: cases.number,
        state: cases.state,
        complaint: cases.complaint,
        mileageKm: cases.mileageKm,
        answer: cases.conclusionCauseId,
        fuelType: vehicles.fuelType,
        drivetrain: vehicles.drivetrain,
        year: vehicles.year,
      })
      .from(cases)
      .innerJoin(vehicles, eq(vehicles.id, cases.vehicleId))
      .where(and(eq(cases.id, caseId), eq(cases.workshopId, member.workshopId)));
    if (!c) refuse(404, "No such case in this workshop.");
    if (!c.answer || (c.state !== "concluded" && c.state !== "closed"))
      refuse(409, "Only a case with a confirmed cause can be kept as a test case.");
    const [obs, found] = await Promise.all([
      tx
        .select({
          symptomId: observations.symptomId,
          present: observations.present,
          source: observations.source,
        })
        .from(observations)
        .where(eq(observations.caseId, caseId)),
      tx
        .select({ checkId: findings.checkId, result: findings.result })
        .from(findings)
        .where(eq(findings.caseId, caseId)),
    ]);
    const [kept] = await tx
      .insert(kbTestCases)
      .values({
        workshopId: member.workshopId,
        name,
        complaint: c.complaint,
        fuelType: c.fuelType,
        drivetrain: c.drivetrain,
        year: c.year,
        mileageKm: c.mileageKm,
        evidence: { observations: obs, findings: found },
        answerCauseId: c.answer,
        fromCaseId: c.id,
        keptById: member.memberId,
      })
      .returning({ id: kbTestCases.id });
    await audit(tx, {
      workshopId: member.workshopId,
      actorUserId: member.userId,
      action: "kb.test_case.keep",
      entity: "kb_test_case",
      entityId: kept.id,
      after: { name, caseNumber: c.number, items: [c.answer] },
    });
    return { id: kept.id, name };
  });
}

export async function removeTestCase(db: Db, member: Member, id: string) {
  requireId(id, NOT_FOUND);
  const [gone] = await db
    .delete(kbTestCases)
    .where(and(eq(kbTestCases.id, id), eq(kbTestCases.workshopId, member.workshopId)))
    .returning({ name: kbTestCases.name, answer: kbTestCases.answerCauseId });
  if (!gone) refuse(404, NOT_FOUND);
  await audit(db, {
    workshopId: member.workshopId,
    actorUserId: member.userId,
    action: "kb.test_case.remove",
    entity: "kb_test_case",
    entityId: id,
    before: { name: gone.name },
    after: { items: [gone.answer] },
  });
  return gone.name;
}

function readTestCases(db: Db, workshopId: string) {
  return db
    .select({ t: kbTestCases, answerName: causes.name, caseNumber: cases.number })
    .from(kbTestCases)
    .innerJoin(causes, eq(causes.id, kbTestCases.answerCauseId))
    .leftJoin(cases, eq(cases.id, kbTestCases.fromCaseId))
    .where(eq(kbTestCases.workshopId, workshopId))
    .orderBy(asc(kbTestCases.name));
}

const toImpactCase = ({ t, answerName }: Awaited<ReturnType<typeof readTestCases>>[number]): ImpactCase => ({
  id: t.id,
  number: 0,
  label: t.name,
  answerId: t.answerCauseId,
  answerName,
  fuel: t.fuelType,
  facts: vehicleFacts({
    fuelType: t.fuelType,
    drivetrain: t.drivetrain,
    year: t.year,
    mileageKm: t.mileageKm,
  }),
  evidence: t.evidence,
});

/** The test cases as the impact preview ranks them. */
export async function testImpactCases(db: Db, workshopId: string): Promise<ImpactCase[]> {
  return (await readTestCases(db, workshopId)).map(toImpactCase);
}

/** The test cases with where each one's known answer stands under the base as it is now. */
export async function listTestCases(db: Db, workshopId: string) {
  const [rows, version, [w], outcomes] = await Promise.all([
    readTestCases(db, workshopId),
    kbVersion(db, workshopId),
    db
      .select({ labourRate: workshops.labourRatePerHour })
      .from(workshops)
      .where(eq(workshops.id, workshopId)),
    outcomesByFuel(db, workshopId),
  ]);
  const kb = await loadKnowledge(db, workshopId, version);
  // Ranked as the live ranking ranks: the base and the workshop's outcome counts.
  const now = places(kb, rows.map(toImpactCase), w.labourRate, outcomes);
  return {
    kbVersion: version,
    tests: rows.map(({ t, answerName, caseNumber }, i) => ({
      id: t.id,
      name: t.name,
      complaint: t.complaint,
      answerName,
      fromCase: t.fromCaseId && caseNumber !== null ? { id: t.fromCaseId, number: caseNumber } : null,
      evidence: t.evidence.observations.length + t.evidence.findings.length,
      place: now[i],
    })),
  };
}
