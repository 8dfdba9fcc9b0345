import { and, desc, eq } from "drizzle-orm";
import type { Db } from "~/db/client.server";
import { auditLog, users } from "~/db/schema";

/** Who did what on one case, newest first: the audit rows written with every change. One query. */
export async function caseHistory(db: Db, workshopId: string, caseId: string, limit = 60) {
  return db
    .select({ id: auditLog.id, at: auditLog.at, action: auditLog.action, after: auditLog.after, actor: users.name })
    .from(auditLog)
    .leftJoin(users, eq(users.id, auditLog.actorUserId))
    .where(and(eq(auditLog.workshopId, workshopId), eq(auditLog.entity, "case"), eq(auditLog.entityId, caseId)))
    .orderBy(desc(auditLog.at), desc(auditLog.id))
    .limit(limit);
}
