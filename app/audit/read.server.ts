import { desc, eq, sql } from "drizzle-orm";
import { alias } from "drizzle-orm/pg-core";
import type { Db } from "~/db/client.server";
import { auditLog, cases, invitations, members, users } from "~/db/schema";

const subjectMember = alias(members, "subject_member");
const subjectUser = alias(users, "subject_user");

/**
 * The newest entries first, each with what it concerns: the case's number, the member's name or
 * the invitee, so the log reads as sentences with links (app/audit/describe.ts). One query.
 */
export async function readAuditLog(db: Db, workshopId: string, limit = 200) {
  const rows = await db
    .select({
      id: auditLog.id,
      at: auditLog.at,
      action: auditLog.action,
      entity: auditLog.entity,
      entityId: auditLog.entityId,
      before: auditLog.before,
      after: auditLog.after,
      actor: users.name,
      caseId: cases.id,
      caseNumber: cases.number,
      personName: subjectUser.name,
      invitee: sql<string | null>`coalesce(${invitations.email}, ${invitations.githubLogin})`,
    })
    .from(auditLog)
    .leftJoin(users, eq(users.id, auditLog.actorUserId))
    .leftJoin(
      cases,
      sql`${auditLog.entity} = 'case' and ${cases.id}::text = ${auditLog.entityId} and ${cases.workshopId} = ${auditLog.workshopId}`,
    )
    .leftJoin(
      subjectMember,
      sql`${auditLog.entity} = 'member' and ${subjectMember.id}::text = ${auditLog.entityId} and ${subjectMember.workshopId} = ${auditLog.workshopId}`,
    )
    .leftJoin(subjectUser, eq(subjectUser.id, subjectMember.userId))
    .leftJoin(
      invitations,
      sql`${auditLog.entity} = 'invitation' and ${invitations.id}::text = ${auditLog.entityId} and ${invitations.workshopId} = ${auditLog.workshopId}`,
    )
    .where(eq(auditLog.workshopId, workshopId))
    .orderBy(desc(auditLog.at), desc(auditLog.id))
    .limit(limit);
  return rows.map(({ caseId, caseNumber, personName, invitee, ...r }) => ({
    ...r,
    subject: { caseId, caseNumber, personName, invitee },
  }));
}
