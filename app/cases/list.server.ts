import { and, desc, eq, ilike, or, sql, type SQL } from "drizzle-orm";
import type { Db } from "~/db/client.server";
import {
  cases,
  causes,
  members,
  ownerDecisions,
  ownerLinks,
  payments,
  sentEstimates,
  users,
  vehicles,
} from "~/db/schema";
import { ownerStateOf, type OwnerCounts } from "~/estimates/owner-state";

import { latestNote, type NoteRow } from "./notes.server";
import type { CaseState } from "~/domain/cases";

export type CaseFilter = { state?: CaseState; q?: string; assignedTo?: string; limit?: number };

// The newest estimate sent to the owner, in counts: what the owner-side state is worked out from.
const ownerCounts = sql<OwnerCounts | null>`(
  select json_build_object(
    'opened', exists(select 1 from ${ownerLinks} where ${ownerLinks.sentEstimateId} = s.id and ${ownerLinks.firstOpenedAt} is not null),
    'answered', s.answered_at is not null,
    'decided', (select count(*) from ${ownerDecisions} where ${ownerDecisions.sentEstimateId} = s.id),
    'approved', (select count(*) from ${ownerDecisions} where ${ownerDecisions.sentEstimateId} = s.id and ${ownerDecisions.decision} = 'approved'),
    'paid', exists(select 1 from ${payments} where ${payments.sentEstimateId} = s.id and ${payments.status} = 'paid'))
  from ${sentEstimates} s where s.case_id = ${cases.id} order by s.version desc limit 1)`;

/** One query for the case list, scoped to the workshop; the search matches plate, VIN, make, model or complaint. */
export async function listCases(db: Db, workshopId: string, filter: CaseFilter = {}) {
  const where: SQL[] = [eq(cases.workshopId, workshopId)];
  if (filter.state) where.push(eq(cases.state, filter.state));
  if (filter.assignedTo) where.push(eq(cases.assignedMemberId, filter.assignedTo));
  if (filter.q) {
    const like = `%${filter.q.replace(/[%_\\]/g, (c) => `\\${c}`)}%`;
    where.push(
      or(
        ilike(vehicles.registration, like),
        ilike(vehicles.vin, like),
        ilike(vehicles.make, like),
        ilike(vehicles.model, like),
        ilike(cases.complaint, like),
        sql`${cases.number}::text = ${filter.q.replace(/^#/, "")}`,
      )!,
    );
  }
  const rows = await db
    .select({
      id: cases.id,
      number: cases.number,
      state: cases.state,
      complaint: cases.complaint,
      needsSenior: cases.needsSenior,
      openedAt: cases.openedAt,
      registration: vehicles.registration,
      vehicle: sql<string>`${vehicles.make} || ' ' || ${vehicles.model} || ' (' || ${vehicles.year} || ')'`,
      assignedName: users.name,
      conclusion: causes.name,
      // What the apprentice asked, while the case waits for a senior: the senior reads it on the board.
      question: sql<NoteRow | null>`case when ${cases.needsSenior} then ${latestNote(["case.ask_senior"])} end`,
      owner: ownerCounts,
    })
    .from(cases)
    .innerJoin(vehicles, eq(vehicles.id, cases.vehicleId))
    .leftJoin(members, eq(members.id, cases.assignedMemberId))
    .leftJoin(users, eq(users.id, members.userId))
    .leftJoin(causes, eq(causes.id, cases.conclusionCauseId))
    .where(and(...where))
    .orderBy(desc(cases.openedAt), desc(cases.number))
    .limit(filter.limit ?? 100);
  return rows.map(({ owner, ...r }) => ({ ...r, ownerState: ownerStateOf(owner) }));
}

export type CaseListItem = Awaited<ReturnType<typeof listCases>>[number];
