import { desc, eq } from "drizzle-orm";
import type { Db } from "~/db/client.server";
import { auditLog, users } from "~/db/schema";

/** The newest entries first; one query with the actor's name joined in. */
export async function readAuditLog(db: Db, workshopId: string, limit = 200) {
  return db
    .select({ id: auditLog.id, at: auditLog.at, action: auditLog.action, entity: auditLog.entity, entityId: auditLog.entityId, before: auditLog.before, after: auditLog.after, actor: users.name })
    .from(auditLog)
    .leftJoin(users, eq(users.id, auditLog.actorUserId))
    .where(eq(auditLog.workshopId, workshopId))
    .orderBy(desc(auditLog.at), desc(auditLog.id))
    .limit(limit);
}
