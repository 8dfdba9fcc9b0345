import { and, eq } from "drizzle-orm";
import { audit } from "~/audit/write.server";
import type { CurrentMember } from "~/auth/guards.server";
import { mayDoCheck, mayWorkOn } from "~/domain/case-access";
import type { Db } from "~/db/client.server";
import { checks, findings, observations, symptoms } from "~/db/schema";
import { refuse, requireId } from "~/http/errors.server";
import { evaluateRule, MeasureError } from "~/measure";
import type { CaseFields } from "./case.server";

/** Who may add evidence: technicians and seniors on any case, an apprentice on the cases given to them. */
export function assertCanWork(member: CurrentMember, c: Pick<CaseFields, "assignedMemberId" | "state">) {
  if (!mayWorkOn(member, c)) refuse(403, "Your role cannot record evidence on this case.");
  if (c.state !== "open")
    refuse(409, "This case is no longer open, so its evidence is fixed. A senior can reopen it.");
}

export type ObservationShown = CaseFields["observations"][number];
export type FindingShown = CaseFields["findings"][number];

export async function recordObservation(
  db: Db,
  member: CurrentMember,
  c: CaseFields,
  input: { symptomId: string; present: boolean; source: "owner" | "technician"; note?: string },
): Promise<ObservationShown> {
  assertCanWork(member, c);
  const [symptom] = await db
    .select({ id: symptoms.id, name: symptoms.name })
    .from(symptoms)
    .where(and(eq(symptoms.id, input.symptomId), eq(symptoms.workshopId, member.workshopId)));
  if (!symptom) refuse(400, "That symptom is not in this workshop's knowledge base.");
  return db.transaction(async (tx) => {
    // One row per symptom and case: saying it again changes present/absent instead of adding a twin.
    const [row] = await tx
      .insert(observations)
      .values({
        workshopId: member.workshopId,
        caseId: c.id,
        symptomId: input.symptomId,
        present: input.present,
        source: input.source,
        note: input.note ?? null,
        recordedById: member.memberId,
      })
      .onConflictDoUpdate({
        target: [observations.caseId, observations.symptomId],
        set: {
          present: input.present,
          source: input.source,
          note: input.note ?? null,
          recordedById: member.memberId,
        },
      })
      .returning({ id: observations.id, recordedAt: observations.recordedAt });
    await audit(tx, {
      workshopId: member.workshopId,
      actorUserId: member.userId,
      action: "case.observation",
      entity: "case",
      entityId: c.id,
      after: { symptom: symptom.name, present: input.present, source: input.source },
    });
    return {
      id: row.id,
      symptomId: symptom.id,
      name: symptom.name,
      present: input.present,
      source: input.source,
      note: input.note ?? null,
      recordedAt: row.recordedAt,
      by: member.name,
    };
  });
}

export async function removeObservation(db: Db, member: CurrentMember, c: CaseFields, observationId: string) {
  assertCanWork(member, c);
  requireId(observationId, "That observation is not on this case.");
  await db.transaction(async (tx) => {
    const gone = await tx
      .delete(observations)
      .where(
        and(
          eq(observations.id, observationId),
          eq(observations.caseId, c.id),
          eq(observations.workshopId, member.workshopId),
        ),
      )
      .returning();
    if (gone.length === 0) refuse(404, "That observation is not on this case.");
    await audit(tx, {
      workshopId: member.workshopId,
      actorUserId: member.userId,
      action: "case.observation_remove",
      entity: "case",
      entityId: c.id,
      before: { symptomId: gone[0].symptomId, present: gone[0].present },
    });
  });
}

export async function recordFinding(
  db: Db,
  member: CurrentMember,
  c: CaseFields,
  input: { checkId: string; result?: "pass" | "fail"; reading?: string; note?: string },
): Promise<FindingShown> {
  assertCanWork(member, c);
  const [check] = await db
    .select({
      id: checks.id,
      name: checks.name,
      skill: checks.skill,
      resultKind: checks.resultKind,
      rule: checks.rule,
      unit: checks.unit,
    })
    .from(checks)
    .where(and(eq(checks.id, input.checkId), eq(checks.workshopId, member.workshopId)));
  if (!check) refuse(400, "That check is not in this workshop's knowledge base.");
  if (!mayDoCheck(member, check.skill)) refuse(403, `“${check.name}” needs a ${check.skill}. Ask a senior.`);
  if (c.findings.some((f) => f.checkId === check.id))
    refuse(
      409,
      `“${check.name}” is recorded on this case already. Remove that finding first to record it again.`,
    );

  let result = input.result;
  let reading: string | null = null;
  let value: number | null = null;
  if (check.resultKind === "measurement") {
    if (!input.reading)
      refuse(
        400,
        `“${check.name}” needs a reading with its unit, such as ${
          check.rule
            ?.split(/[<>=]+/)
            .pop()
            ?.trim() ?? `1 ${check.unit}`
        }.`,
      );
    try {
      const r = evaluateRule(check.rule!, input.reading);
      result = r.result;
      reading = input.reading.trim();
      value = Number.parseFloat(r.reading);
    } catch (error) {
      if (error instanceof MeasureError) refuse(400, error.message, { code: error.code });
      throw error;
    }
  } else if (!result) {
    refuse(400, `Say whether “${check.name}” passed or failed.`);
  }
  return db.transaction(async (tx) => {
    const [row] = await tx
      .insert(findings)
      .values({
        workshopId: member.workshopId,
        caseId: c.id,
        checkId: check.id,
        result: result!,
        reading,
        value,
        unit: check.unit,
        note: input.note ?? null,
        recordedById: member.memberId,
      })
      .onConflictDoNothing()
      .returning({ id: findings.id, result: findings.result, recordedAt: findings.recordedAt });
    // Two people recording the same check at once: the second loses the race and is told so.
    if (!row) refuse(409, `“${check.name}” was recorded by someone else a moment ago.`);
    await audit(tx, {
      workshopId: member.workshopId,
      actorUserId: member.userId,
      action: "case.finding",
      entity: "case",
      entityId: c.id,
      after: { check: check.name, result, reading },
    });
    return {
      id: row.id,
      checkId: check.id,
      name: check.name,
      result: row.result,
      reading,
      note: input.note ?? null,
      recordedAt: row.recordedAt,
      by: member.name,
    };
  });
}

export async function removeFinding(db: Db, member: CurrentMember, c: CaseFields, findingId: string) {
  assertCanWork(member, c);
  requireId(findingId, "That finding is not on this case.");
  await db.transaction(async (tx) => {
    const gone = await tx
      .delete(findings)
      .where(
        and(
          eq(findings.id, findingId),
          eq(findings.caseId, c.id),
          eq(findings.workshopId, member.workshopId),
        ),
      )
      .returning();
    if (gone.length === 0) refuse(404, "That finding is not on this case.");
    await audit(tx, {
      workshopId: member.workshopId,
      actorUserId: member.userId,
      action: "case.finding_remove",
      entity: "case",
      entityId: c.id,
      before: { checkId: gone[0].checkId, result: gone[0].result, reading: gone[0].reading },
    });
  });
}

/**
 * The case as it stands after one change of its evidence, without reading it again: the answer to
 * a recording carries the new ranking in the same round trip (the change was made on this very
 * bundle, in this request).
 */
export function withEvidence<T extends Pick<CaseFields, "observations" | "findings">>(
  c: T,
  change: { added?: ObservationShown | FindingShown; removed?: string },
): T {
  const observations = c.observations.filter((o) => o.id !== change.removed);
  const findings = c.findings.filter((f) => f.id !== change.removed);
  const added = change.added;
  if (added && "symptomId" in added) {
    // Answered again, an observation keeps its row and its place (the list is in recording order).
    const at = observations.findIndex((o) => o.symptomId === added.symptomId);
    return {
      ...c,
      observations: at < 0 ? [...observations, added] : observations.map((o, i) => (i === at ? added : o)),
      findings,
    };
  }
  if (added) return { ...c, observations, findings: [...findings, added] };
  return { ...c, observations, findings };
}
