import { and, eq, type SQL, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import type { CurrentMember } from "~/auth/guards.server";
import type { Db } from "~/db/client.server";
import {
  auditLog,
  cases,
  causes,
  checks,
  findings,
  members,
  observations,
  owners,
  symptoms,
  users,
  vehicles,
  workshops,
} from "~/db/schema";
import type { Json } from "~/http/json-payload";
import { refuse, requireId } from "~/http/errors.server";
import { latestNote } from "./notes.server";

const assigned = alias(members, "assigned");
const assignedUser = alias(users, "assigned_user");
// Aliases for the outcome-count subquery, which reads other rows of the tables the case comes from.
const closedCase = alias(cases, "closed_case");
const closedVehicle = alias(vehicles, "closed_vehicle");

/** How many history rows a case screen shows; the full trail is in the audit log. */
export const CASE_HISTORY_ROWS = 30;

type ObservationRow = {
  id: string;
  symptomId: string;
  name: string;
  present: boolean;
  source: (typeof observations.$inferSelect)["source"];
  note: string | null;
  recordedAt: Date;
  by: string | null;
};
type FindingRow = {
  id: string;
  checkId: string;
  name: string;
  result: (typeof findings.$inferSelect)["result"];
  reading: string | null;
  note: string | null;
  recordedAt: Date;
  by: string | null;
};
type HistoryRow = {
  id: number;
  at: Date;
  action: string;
  before: unknown;
  after: unknown;
  actor: string | null;
};

// The rows under a case come back as JSON arrays inside the case's own row: one round trip to
// PostgreSQL however many observations and findings there are (each query costs more in the
// driver and the loopback network than in the database). Column references go through the schema
// so a rename breaks the build, not the page.
const observationsJson = sql<Json<ObservationRow>[]>`coalesce((
  select json_agg(json_build_object(
    'id', ${observations.id}, 'symptomId', ${observations.symptomId}, 'name', ${symptoms.name}, 'present', ${observations.present},
    'source', ${observations.source}, 'note', ${observations.note}, 'recordedAt', ${observations.recordedAt}, 'by', ${users.name}
  ) order by ${observations.recordedAt}, ${observations.id})
  from ${observations}
  join ${symptoms} on ${symptoms.id} = ${observations.symptomId}
  left join ${members} on ${members.id} = ${observations.recordedById}
  left join ${users} on ${users.id} = ${members.userId}
  where ${observations.caseId} = ${cases.id} and ${observations.workshopId} = ${cases.workshopId}
), '[]'::json)`;

const findingsJson = sql<Json<FindingRow>[]>`coalesce((
  select json_agg(json_build_object(
    'id', ${findings.id}, 'checkId', ${findings.checkId}, 'name', ${checks.name}, 'result', ${findings.result}, 'reading', ${findings.reading},
    'note', ${findings.note}, 'recordedAt', ${findings.recordedAt}, 'by', ${users.name}
  ) order by ${findings.recordedAt}, ${findings.id})
  from ${findings}
  join ${checks} on ${checks.id} = ${findings.checkId}
  left join ${members} on ${members.id} = ${findings.recordedById}
  left join ${users} on ${users.id} = ${members.userId}
  where ${findings.caseId} = ${cases.id} and ${findings.workshopId} = ${cases.workshopId}
), '[]'::json)`;

// Each read asks only for what it uses: the workbench page wants the history, a diagnosis the
// outcome counts, a change (evidence, conclusion, sign-off) neither. One prepared query serves all
// three, the aggregates switched by parameters (PostgreSQL evaluates a CASE branch's subquery only
// when that branch is taken).
const when = (flag: "history" | "outcomes", aggregate: SQL, empty: string) =>
  sql`case when ${sql.placeholder(flag)}::boolean then ${aggregate} else ${sql.raw(`'${empty}'::json`)} end`;

// Newest first, as the history panel reads; the audit rows written with every change of the case.
const historyJson = sql<Json<HistoryRow>[]>`coalesce((
  select json_agg(h order by h."at" desc, h."id" desc) from (
    select ${auditLog.id} as "id", ${auditLog.at} as "at", ${auditLog.action} as "action", ${auditLog.before} as "before", ${auditLog.after} as "after", ${users.name} as "actor"
    from ${auditLog} left join ${users} on ${users.id} = ${auditLog.actorUserId}
    where ${auditLog.workshopId} = ${cases.workshopId} and ${auditLog.entity} = 'case' and ${auditLog.entityId} = ${cases.id}::text
    order by ${auditLog.at} desc, ${auditLog.id} desc
    limit ${sql.raw(String(CASE_HISTORY_ROWS))}
  ) h
), '[]'::json)`;

// How often each cause was the confirmed one on this workshop's closed cases of the same fuel:
// the priors learn from the workshop's own history (see docs/reasoning.md).
const outcomesJson = sql<Record<string, number>>`coalesce((
  select json_object_agg(o.cause_id, o.n) from (
    select ${closedCase.conclusionCauseId} as cause_id, count(*)::int as n
    from ${cases} ${sql.identifier("closed_case")} join ${vehicles} ${sql.identifier("closed_vehicle")} on ${closedVehicle.id} = ${closedCase.vehicleId}
    where ${closedCase.workshopId} = ${cases.workshopId} and ${closedCase.state} = 'closed' and ${closedCase.conclusionCauseId} is not null
      and ${closedVehicle.fuelType} = ${vehicles.fuelType}
    group by ${closedCase.conclusionCauseId}
  ) o
), '{}'::json)`;

function caseQuery(db: Db) {
  return db
    .select({
      id: cases.id,
      number: cases.number,
      state: cases.state,
      complaint: cases.complaint,
      mileageKm: cases.mileageKm,
      needsSenior: cases.needsSenior,
      version: cases.version,
      kbVersion: cases.kbVersion,
      openedAt: cases.openedAt,
      concludedAt: cases.concludedAt,
      conclusionCauseId: cases.conclusionCauseId,
      conclusionCause: causes.name,
      conclusionNotes: cases.conclusionNotes,
      concludedById: cases.concludedById,
      signedOffById: cases.signedOffById,
      assignedMemberId: cases.assignedMemberId,
      assignedName: assignedUser.name,
      vehicle: {
        id: vehicles.id,
        registration: vehicles.registration,
        vin: vehicles.vin,
        make: vehicles.make,
        model: vehicles.model,
        year: vehicles.year,
        engine: vehicles.engine,
        fuelType: vehicles.fuelType,
        drivetrain: vehicles.drivetrain,
      },
      owner: { id: owners.id, name: owners.name, phone: owners.phone, email: owners.email },
      workshop: {
        id: workshops.id,
        kbVersion: workshops.kbVersion,
        labourRatePerHour: workshops.labourRatePerHour,
        currency: workshops.currency,
        units: workshops.units,
      },
      observations: observationsJson,
      findings: findingsJson,
      question: latestNote(["case.ask_senior"]),
      seniorNote: latestNote(["case.signoff", "case.send_back"]),
      history: sql<Json<HistoryRow>[]>`${when("history", historyJson, "[]")}`,
      outcomes: sql<Record<string, number>>`${when("outcomes", outcomesJson, "{}")}`,
    })
    .from(cases)
    .innerJoin(vehicles, eq(vehicles.id, cases.vehicleId))
    .innerJoin(owners, eq(owners.id, vehicles.ownerId))
    .innerJoin(workshops, eq(workshops.id, cases.workshopId))
    .leftJoin(causes, eq(causes.id, cases.conclusionCauseId))
    .leftJoin(assigned, eq(assigned.id, cases.assignedMemberId))
    .leftJoin(assignedUser, eq(assignedUser.id, assigned.userId))
    .where(and(eq(cases.id, sql.placeholder("caseId")), eq(cases.workshopId, sql.placeholder("workshopId"))))
    .prepare("load_case");
}

// Built once per database handle: drizzle then skips rebuilding the SQL, and each pooled
// connection parses and plans it once.
const prepared = new WeakMap<Db, ReturnType<typeof caseQuery>>();

const at = <T extends { recordedAt: string }>(r: T) => ({ ...r, recordedAt: new Date(r.recordedAt) });

/**
 * A case with what its likely causes need: vehicle, owner, workshop, observations, findings and the
 * workshop's outcome counts, in one query. A case of another workshop is "not found", never
 * "forbidden", so ids reveal nothing.
 */
export async function loadCase(
  db: Db,
  member: Pick<CurrentMember, "workshopId">,
  caseId: string,
): Promise<CaseBundle> {
  const { history: _h, ...bundle } = await read(db, member, caseId, { history: false, outcomes: true });
  return bundle;
}

/** The same, with the latest history rows: what the case workbench shows. */
export async function loadCaseWithHistory(db: Db, member: Pick<CurrentMember, "workshopId">, caseId: string) {
  return read(db, member, caseId, { history: true, outcomes: true });
}

/** Only the case's latest history rows, newest first (the case must be this workshop's). */
export async function loadCaseHistory(db: Db, member: Pick<CurrentMember, "workshopId">, caseId: string) {
  return (await read(db, member, caseId, { history: true, outcomes: false })).history;
}

/** The case and its evidence, for a change to it: no history, no outcome counts. */
export async function loadCaseForChange(
  db: Db,
  member: Pick<CurrentMember, "workshopId">,
  caseId: string,
): Promise<CaseFields> {
  const {
    history: _h,
    outcomes: _o,
    ...fields
  } = await read(db, member, caseId, { history: false, outcomes: false });
  return fields;
}

async function read(
  db: Db,
  member: Pick<CurrentMember, "workshopId">,
  caseId: string,
  want: { history: boolean; outcomes: boolean },
) {
  requireId(caseId, "No such case in this workshop.");
  let query = prepared.get(db);
  if (!query) prepared.set(db, (query = caseQuery(db)));
  const [row] = await query.execute({ caseId, workshopId: member.workshopId, ...want });
  if (!row) refuse(404, "No such case in this workshop.");
  return {
    ...row,
    observations: row.observations.map(at) as ObservationRow[],
    findings: row.findings.map(at) as FindingRow[],
    history: row.history.map((h) => ({ ...h, at: new Date(h.at) })) as HistoryRow[],
  };
}

export type CaseBundle = Omit<Awaited<ReturnType<typeof read>>, "history">;
export type CaseFields = Omit<CaseBundle, "outcomes">;

/** The case as its screens and the API show it; the outcome counts only feed the priors. */
export function caseFields({ outcomes: _o, ...fields }: CaseBundle): CaseFields {
  return fields;
}

export function evidenceOf(c: Pick<CaseBundle, "observations" | "findings">) {
  return {
    observations: c.observations.map((o) => ({
      symptomId: o.symptomId,
      present: o.present,
      source: o.source,
    })),
    findings: c.findings.map((f) => ({ checkId: f.checkId, result: f.result })),
  };
}
